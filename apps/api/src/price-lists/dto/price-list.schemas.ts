import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { CSV_DELIMITER_NAMES, CSV_ENCODING_NAMES } from '../csv-formats.js';

export const MAPPING_FIELDS = ['partNumber', 'description', 'price', 'saleUnit', 'packSize'] as const;
export type MappingField = (typeof MAPPING_FIELDS)[number];

const header = z.string().trim().min(1).max(200);

/** Which column (by its header text) holds each field; part number and price are required. */
export const columnMappingSchema = z.object({
  partNumber: header,
  price: header,
  description: header.nullish(),
  saleUnit: header.nullish(),
  packSize: header.nullish(),
});
export type ColumnMapping = z.output<typeof columnMappingSchema>;

/** A form field that may be sent empty: empty means "not chosen". */
const optionalChoice = <T extends z.ZodType>(schema: T) => z.preprocess((value) => (value === '' ? undefined : value), schema.optional());

/**
 * The text fields of the multipart form; `mapping` is JSON and may be left out for a first look.
 * `encoding` and `delimiter` override what is detected in a CSV (ignored for .xlsx).
 */
export const priceListFormSchema = z.object({
  supplierId: z.uuid('Choose one of your suppliers.'),
  mapping: z
    .string()
    .optional()
    .transform((text, ctx) => {
      if (text === undefined || text.trim() === '') return undefined;
      try {
        return JSON.parse(text) as unknown;
      } catch {
        ctx.addIssue({ code: 'custom', message: 'The column mapping is not valid JSON.' });
        return z.NEVER;
      }
    })
    .pipe(columnMappingSchema.optional()),
  encoding: optionalChoice(z.enum(CSV_ENCODING_NAMES, 'Choose one of the offered text encodings.')),
  delimiter: optionalChoice(z.enum(CSV_DELIMITER_NAMES, 'Choose comma, semicolon or tab.')),
});
export class PriceListFormDto extends zodDto(priceListFormSchema) {}
export type PriceListForm = z.output<typeof priceListFormSchema>;
