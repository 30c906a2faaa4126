import { familySchema } from '@linesmith/catalog';
import { z } from 'zod';
import { referenceRowSchema } from './reference-row-schema';

/** One family's table; each row names its own source. */
export const threadTableSchema = z.object({
  family: familySchema,
  label: z.string().min(1),
  rows: z.array(referenceRowSchema),
});

export type ThreadTable = z.infer<typeof threadTableSchema>;

/** `GET /api/reference/threads?family=…`: the list of tables filtered to that one family. */
export const oneFamilyTablesSchema = z
  .array(threadTableSchema)
  .length(1, 'Expected the table of exactly one family.')
  .transform(([table]) => table!);
