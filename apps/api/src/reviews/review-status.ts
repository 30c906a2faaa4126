import { z } from 'zod';

/** A submission is under review until the reviewer approves it or returns it to the fabricator. */
export const REVIEW_STATUSES = ['in-review', 'approved', 'returned'] as const;
export const reviewStatusSchema = z.enum(REVIEW_STATUSES);
export type ReviewStatus = z.infer<typeof reviewStatusSchema>;
