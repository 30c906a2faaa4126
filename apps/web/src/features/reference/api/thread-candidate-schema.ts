import { familySchema, type ThreadCandidate } from '@linesmith/catalog';
import { z } from 'zod';

/** One answer of `POST /api/reference/identify` (the catalog's `identifyThread` result). */
export const threadCandidateSchema = z.object({
  family: familySchema,
  size: z.string().min(1),
  designation: z.string().min(1),
  score: z.number().min(0).max(1),
  hint: z.string(),
  flankAngleDeg: z.union([z.literal(55), z.literal(60)]),
  question: z.string().optional(),
}) satisfies z.ZodType<ThreadCandidate>;
