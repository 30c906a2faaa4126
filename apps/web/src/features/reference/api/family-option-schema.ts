import { familySchema } from '@linesmith/catalog';
import { z } from 'zod';

/** One entry of `GET /api/reference/families`. */
export const familyOptionSchema = z.object({ family: familySchema, label: z.string().min(1) });

export type FamilyOption = z.infer<typeof familyOptionSchema>;
