import { z } from 'zod';

/** Where a vehicle job stands in the shop. */
export const BUILD_STATUSES = ['open', 'on-hold', 'done'] as const;
export const buildStatusSchema = z.enum(BUILD_STATUSES);
export type BuildStatus = z.infer<typeof buildStatusSchema>;
