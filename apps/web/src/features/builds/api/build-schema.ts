import { z } from 'zod';

export const buildStatusSchema = z.enum(['open', 'on-hold', 'done']);
export type BuildStatus = z.infer<typeof buildStatusSchema>;

const count = z.number().int().nonnegative();

const flatCountsSchema = z.object({
  total: count,
  draft: count,
  inReview: count,
  returned: count,
  approved: count,
  ordered: count,
  installed: count,
});
export type CircuitCounts = z.infer<typeof flatCountsSchema>;

/** The same counts keyed by circuit status (`{ total, byStatus: { 'in-review': 1, … } }`), as the API also sends them. */
const byStatusCountsSchema = z
  .object({
    total: count,
    byStatus: z.object({
      draft: count.default(0),
      'in-review': count.default(0),
      returned: count.default(0),
      approved: count.default(0),
      ordered: count.default(0),
      installed: count.default(0),
    }),
  })
  .transform(({ total, byStatus }): CircuitCounts => ({
    total,
    draft: byStatus.draft,
    inReview: byStatus['in-review'],
    returned: byStatus.returned,
    approved: byStatus.approved,
    ordered: byStatus.ordered,
    installed: byStatus.installed,
  }));

/** How many of the build's circuits are in each status (builds list and detail). */
export const circuitCountsSchema = z.union([flatCountsSchema, byStatusCountsSchema]);

const optionalText = z.string().nullish().transform((v) => v ?? '');

/** Free text on the server; a year typed as a number by older clients reads the same. */
const yearText = z
  .union([z.string(), z.number().int()])
  .nullish()
  .transform((v) => (v === null || v === undefined ? '' : String(v)));

export const vehicleSchema = z.object({
  year: yearText,
  make: optionalText,
  model: optionalText,
  engine: optionalText,
  transmission: optionalText,
});
export type Vehicle = z.infer<typeof vehicleSchema>;

export const customerSchema = z.object({ name: optionalText, phone: optionalText, email: optionalText });
export type Customer = z.infer<typeof customerSchema>;

/** Who started the build: the contract's `createdBy`, or only the id where the API sends `createdById`. */
const createdBySchema = z
  .looseObject({
    createdBy: z.object({ id: z.string().min(1), displayName: z.string() }).nullish(),
    createdById: z.string().nullish(),
  })
  .transform(({ createdBy, createdById }) => createdBy ?? (createdById ? { id: createdById, displayName: '' } : null));

/** `Build` of the API contract. Optional text arrives as '' or null; both read as ''. */
export const buildSchema = z
  .looseObject({
    id: z.string().min(1),
    vehicle: vehicleSchema,
    customer: customerSchema,
    notes: optionalText,
    status: buildStatusSchema,
    version: z.number().int(),
    createdAt: z.iso.datetime({ offset: true }),
    updatedAt: z.iso.datetime({ offset: true }),
    circuitCounts: circuitCountsSchema,
  })
  .and(createdBySchema.transform((createdBy) => ({ createdBy })))
  .transform(({ id, vehicle, customer, notes, status, version, createdAt, updatedAt, circuitCounts, createdBy }) => ({
    id,
    vehicle,
    customer,
    notes,
    status,
    version,
    createdAt,
    updatedAt,
    circuitCounts,
    createdBy,
  }));
export type Build = z.output<typeof buildSchema>;
