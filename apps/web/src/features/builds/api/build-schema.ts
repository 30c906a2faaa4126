import { z } from 'zod';

export const buildStatusSchema = z.enum(['open', 'on-hold', 'done']);
export type BuildStatus = z.infer<typeof buildStatusSchema>;

const count = z.number().int().nonnegative();

/** How many of the build's circuits are in each status (builds list and detail). */
export const circuitCountsSchema = z.object({
  total: count,
  draft: count,
  inReview: count,
  returned: count,
  approved: count,
  ordered: count,
  installed: count,
});
export type CircuitCounts = z.infer<typeof circuitCountsSchema>;

export const vehicleSchema = z.object({
  year: z.number().int().nullable(),
  make: z.string(),
  model: z.string(),
  engine: z.string(),
  transmission: z.string(),
});
export type Vehicle = z.infer<typeof vehicleSchema>;

export const customerSchema = z.object({
  name: z.string(),
  phone: z.string(),
  email: z.string(),
});
export type Customer = z.infer<typeof customerSchema>;

/** `Build` of the API contract. Optional text arrives as '' or null; both read as ''. */
export const buildSchema = z.object({
  id: z.string().min(1),
  vehicle: z.object({
    ...vehicleSchema.shape,
    engine: z.string().nullish().transform((v) => v ?? ''),
    transmission: z.string().nullish().transform((v) => v ?? ''),
  }),
  customer: z.object({
    name: z.string(),
    phone: z.string().nullish().transform((v) => v ?? ''),
    email: z.string().nullish().transform((v) => v ?? ''),
  }),
  notes: z.string().nullish().transform((v) => v ?? ''),
  status: buildStatusSchema,
  createdBy: z.object({ id: z.string().min(1), displayName: z.string() }),
  version: z.number().int(),
  createdAt: z.iso.datetime({ offset: true }),
  updatedAt: z.iso.datetime({ offset: true }),
  circuitCounts: circuitCountsSchema,
});
export type Build = z.infer<typeof buildSchema>;
