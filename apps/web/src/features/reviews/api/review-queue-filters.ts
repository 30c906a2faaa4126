import { z } from 'zod';

export const reviewQueueStatusSchema = z.enum(['in-review', 'returned', 'approved']);
export type ReviewQueueStatus = z.infer<typeof reviewQueueStatusSchema>;

export const reviewQueueSortSchema = z.enum(['submittedAt', 'build']);
export type ReviewQueueSort = z.infer<typeof reviewQueueSortSchema>;

/** The queue's filter and order, as the page keeps them in the address bar. */
export const reviewQueueFiltersSchema = z.object({
  status: reviewQueueStatusSchema.catch('in-review'),
  sort: reviewQueueSortSchema.catch('submittedAt'),
});
export type ReviewQueueFilters = z.infer<typeof reviewQueueFiltersSchema>;

export const reviewQueueStatusLabels: Readonly<Record<ReviewQueueStatus, string>> = {
  'in-review': 'Waiting for review',
  returned: 'Returned',
  approved: 'Approved',
};
