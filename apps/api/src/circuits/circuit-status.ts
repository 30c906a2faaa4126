import { z } from 'zod';

/** The life of a circuit: sketched, checked by the shop lead, ordered, built. */
export const CIRCUIT_STATUSES = ['draft', 'in-review', 'returned', 'approved', 'ordered', 'installed'] as const;
export const circuitStatusSchema = z.enum(CIRCUIT_STATUSES);
export type CircuitStatus = z.infer<typeof circuitStatusSchema>;
