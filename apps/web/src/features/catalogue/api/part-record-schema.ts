import { partSchema } from '@linesmith/catalog';
import { z } from 'zod';

/** A part as the API sends it: the catalogue library's `Part` plus the row version edits quote. */
export const partRecordSchema = z.intersection(partSchema, z.object({ version: z.number().int() }));
export type PartRecord = z.output<typeof partRecordSchema>;

export const partPageSchema = z.object({
  items: z.array(partRecordSchema),
  total: z.number().int().nonnegative(),
  page: z.number().int().positive(),
  pageSize: z.number().int().positive(),
});
export type PartPage = z.output<typeof partPageSchema>;
