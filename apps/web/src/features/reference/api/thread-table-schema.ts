import { familySchema } from '@linesmith/catalog';
import { z } from 'zod';
import { referenceRowSchema } from './reference-row-schema';

/** `GET /api/reference/threads?family=…`. */
export const threadTableSchema = z.object({
  family: familySchema,
  label: z.string().min(1),
  source: z.string().min(1),
  rows: z.array(referenceRowSchema),
});

export type ThreadTable = z.infer<typeof threadTableSchema>;
