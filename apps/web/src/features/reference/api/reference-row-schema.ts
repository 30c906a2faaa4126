import type { ReferenceRow } from '@linesmith/catalog';
import { z } from 'zod';

/** A row of `threadTable(family)` as the API sends it; tied to the catalog's type by `satisfies`. */
export const referenceRowSchema = z.object({
  size: z.string().min(1),
  designation: z.string().min(1),
  majorDiameterIn: z.number().positive(),
  tpi: z.number().positive().optional(),
  pitchMm: z.number().positive().optional(),
  tubeOdIn: z.number().positive().optional(),
  tapered: z.boolean(),
  basicPitchDiameterIn: z.number().positive().optional(),
  e0: z.number().positive().optional(),
  l2: z.number().positive().optional(),
  seal: z.string().optional(),
  flankAngleDeg: z.union([z.literal(55), z.literal(60)]).optional(),
  seatForms: z
    .array(z.object({ seat: z.string().min(1), label: z.string().min(1), seal: z.string().optional(), tubeOdMm: z.number().positive().optional() }))
    .optional(),
  source: z.string().min(1),
}) satisfies z.ZodType<ReferenceRow>;
