import { familySchema, parseDash, partKindSchema, type Part } from '@linesmith/catalog';
import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { versionSchema, pageSchema } from '../../common/validation/numbers.js';

type DistributiveOmit<T, K extends PropertyKey> = T extends unknown ? Omit<T, K> : never;

/** A part as written by a client: everything but the id, which the database assigns. */
export type PartFields = DistributiveOmit<Part, 'id'>;

/** A new part's fields; the service checks the whole part with the library's `partSchema`. */
export const createPartSchema = z.looseObject({});
export class CreatePartDto extends zodDto(createPartSchema) {}
export type NewPartBody = z.output<typeof createPartSchema>;

/**
 * Changed fields against a version; the service merges them into the current part and validates the whole.
 * `stockOnHand` is dropped: stock changes only through stock adjustments, which keep its history.
 */
export const updatePartSchema = z
  .looseObject({ version: versionSchema })
  .transform(({ stockOnHand: _stockOnHand, ...changes }) => changes);
export class UpdatePartDto extends zodDto(updatePartSchema) {}
export type PartChanges = z.output<typeof updatePartSchema>;

const booleanQuery = z.enum(['true', 'false']).transform((value) => value === 'true');

export const PART_SORT_KEYS = ['description', 'kind', 'supplierPartNumber', 'priceCents', 'stockOnHand'] as const;

export const listPartsQuerySchema = z.object({
  kind: partKindSchema.optional(),
  family: familySchema.optional(),
  /** A size as DOMAIN §1 writes it ("-6", "3/8", "1/4", "M14x1.5"); matched within `family` when given. */
  size: z.string().trim().min(1).max(20).optional(),
  /** "-6" or "6": hoses and hose ends of that dash, and ends of that tube size. */
  dash: z
    .string()
    .transform((text, ctx) => {
      const dash = parseDash(text);
      if (dash === undefined) ctx.addIssue({ code: 'custom', message: 'Give a dash size such as -6.' });
      return dash;
    })
    .optional(),
  /** A hose part id: the hose ends, clamps and sleeves that fit that hose. */
  fitsHose: z.uuid('Give the id of a hose in your catalogue.').optional(),
  supplierId: z.uuid('Give the id of one of your suppliers.').optional(),
  search: z.string().trim().max(200).optional(),
  includeRetired: booleanQuery.default(false),
  sort: z.enum(PART_SORT_KEYS).default('description'),
  direction: z.enum(['asc', 'desc']).default('asc'),
  page: pageSchema,
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export class ListPartsQueryDto extends zodDto(listPartsQuerySchema) {}
export type ListPartsQuery = z.output<typeof listPartsQuerySchema>;
