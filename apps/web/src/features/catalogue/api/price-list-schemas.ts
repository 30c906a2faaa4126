import { z } from 'zod';

/** Which column of the file holds each field; values are header texts of the file. */
export const priceListMappingFields = ['partNumber', 'description', 'price', 'saleUnit', 'packSize'] as const;
export type PriceListMappingField = (typeof priceListMappingFields)[number];
export type PriceListMapping = Partial<Record<PriceListMappingField, string>>;

/** Fields a price list must map; the others are optional. */
export const requiredMappingFields: readonly PriceListMappingField[] = ['partNumber', 'price'];

export const mappingFieldLabels: Record<PriceListMappingField, string> = {
  partNumber: 'Supplier part number',
  description: 'Description',
  price: 'Price',
  saleUnit: 'Sale unit',
  packSize: 'Pack size',
};

export const importIssueSchema = z.object({
  row: z.number().int(),
  column: z.string().nullish().transform((v) => v ?? ''),
  message: z.string(),
});
export type ImportIssue = z.output<typeof importIssueSchema>;

export const importCountsSchema = z.object({
  new: z.number().int().nonnegative().default(0),
  updated: z.number().int().nonnegative().default(0),
  unchanged: z.number().int().nonnegative().default(0),
  errors: z.number().int().nonnegative().default(0),
});
export type ImportCounts = z.output<typeof importCountsSchema>;

const mappingSchema = z
  .record(z.string(), z.string().nullish())
  .transform((raw): PriceListMapping => {
    const mapping: PriceListMapping = {};
    for (const field of priceListMappingFields) {
      const column = raw[field];
      if (column) mapping[field] = column;
    }
    return mapping;
  });

const readingChoiceSchema = z.object({ value: z.string(), label: z.string() });

/** How the API read the file, in plain words ("Read as Windows-1252, separated by semicolons."); for a CSV also what may be chosen instead. */
export const priceListReadingSchema = z.discriminatedUnion('format', [
  z.looseObject({ format: z.literal('xlsx'), sheetName: z.string(), summary: z.string() }),
  z.looseObject({
    format: z.literal('csv'),
    encoding: z.string(),
    encodingDetected: z.boolean(),
    delimiter: z.string(),
    delimiterDetected: z.boolean(),
    summary: z.string(),
    choices: z.object({ encodings: z.array(readingChoiceSchema), delimiters: z.array(readingChoiceSchema) }),
  }),
]);
export type PriceListReading = z.output<typeof priceListReadingSchema>;

/** A CSV's text encoding and separator chosen by the user over what the API detects; empty means "detect". */
export interface CsvReadingChoice {
  encoding?: string;
  delimiter?: string;
}

/** `POST /api/price-lists/preview`: how the file was read, the header row, the (guessed or given) mapping and the dry run. */
export const pricePreviewSchema = z.looseObject({
  readAs: priceListReadingSchema,
  headers: z.array(z.string()),
  mapping: mappingSchema.default({}),
  rows: z.array(z.unknown()).default([]),
  report: z.array(importIssueSchema).default([]),
  counts: importCountsSchema.default({ new: 0, updated: 0, unchanged: 0, errors: 0 }),
});
export type PricePreview = z.output<typeof pricePreviewSchema>;

/** `POST /api/price-lists/commit` answers the counts (either bare or under `counts`). */
export const priceCommitSchema = z.union([
  z.looseObject({ counts: importCountsSchema }).transform((body) => body.counts),
  importCountsSchema,
]);

/** A refused commit (400) carries the same row-by-row report. */
export const reportBodySchema = z.looseObject({ report: z.array(importIssueSchema) });
