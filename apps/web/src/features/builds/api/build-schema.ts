import { z } from 'zod';
import { userRefSchema } from '../../../lib/contract/user-ref-schema';
import { circuitStatusSchema } from '../../circuits/api/circuit-schema';

export const buildStatusSchema = z.enum(['open', 'on-hold', 'done']);
export type BuildStatus = z.infer<typeof buildStatusSchema>;

const count = z.number().int().nonnegative();

/**
 * How many of the build's circuits are in each status (builds list and detail). The API keys them
 * by circuit status (`{ total, byStatus: { 'in-review': 1, … } }`); screens read them flat.
 */
export const circuitCountsSchema = z
  .object({
    total: count,
    byStatus: z.record(circuitStatusSchema, count),
  })
  .transform(({ total, byStatus }) => ({
    total,
    draft: byStatus.draft,
    inReview: byStatus['in-review'],
    returned: byStatus.returned,
    approved: byStatus.approved,
    ordered: byStatus.ordered,
    installed: byStatus.installed,
  }));
export type CircuitCounts = z.output<typeof circuitCountsSchema>;

/** Free text; '' where not known. */
const text = z.string();

export const vehicleSchema = z.object({
  year: text,
  make: text,
  model: text,
  engine: text,
  transmission: text,
});
export type Vehicle = z.infer<typeof vehicleSchema>;

export const customerSchema = z.object({ name: text, phone: text, email: text });
export type Customer = z.infer<typeof customerSchema>;

/** `Build` of the API (`BuildDto`). */
export const buildSchema = z.object({
  id: z.string().min(1),
  vehicle: vehicleSchema,
  customer: customerSchema,
  notes: text,
  status: buildStatusSchema,
  /** Null once the account is gone. */
  createdBy: userRefSchema.nullable(),
  version: z.number().int(),
  createdAt: z.iso.datetime({ offset: true }),
  updatedAt: z.iso.datetime({ offset: true }),
  circuitCounts: circuitCountsSchema,
});
export type Build = z.output<typeof buildSchema>;
/** A build as the API sends it (before parsing). */
export type BuildBody = z.input<typeof buildSchema>;
