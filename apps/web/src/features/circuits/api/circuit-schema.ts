import { fluidSchema } from '@linesmith/catalog';
import { circuitKindSchema } from '@linesmith/routing';
import { z } from 'zod';

export const circuitStatusSchema = z.enum(['draft', 'in-review', 'returned', 'approved', 'ordered', 'installed']);
export type CircuitStatus = z.infer<typeof circuitStatusSchema>;

/** `Circuit` of the API contract (the sketch itself is the draft document, fetched separately). */
export const circuitSchema = z.object({
  id: z.string().min(1),
  buildId: z.string().min(1),
  name: z.string(),
  kind: circuitKindSchema,
  fluid: fluidSchema,
  maxPressurePsi: z.number().finite(),
  maxTempF: z.number().finite(),
  status: circuitStatusSchema,
  draftVersion: z.number().int(),
  createdAt: z.iso.datetime({ offset: true }),
  updatedAt: z.iso.datetime({ offset: true }),
});
export type Circuit = z.infer<typeof circuitSchema>;

export const circuitListSchema = z.array(circuitSchema);
