import type { ReviewQueueFilters } from './review-queue-filters';

/** Query keys of the reviews feature; every review mutation invalidates `all`. */
export const reviewKeys = {
  all: ['reviews'] as const,
  queues: () => [...reviewKeys.all, 'queue'] as const,
  queue: (filters: ReviewQueueFilters) => [...reviewKeys.queues(), filters] as const,
  review: (circuitId: string) => [...reviewKeys.all, 'circuit', circuitId] as const,
  audit: (circuitId: string) => [...reviewKeys.review(circuitId), 'audit'] as const,
  comparison: (circuitId: string, from: string, to: string) => [...reviewKeys.review(circuitId), 'compare', from, to] as const,
};
