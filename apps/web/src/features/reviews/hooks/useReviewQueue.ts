import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { reviewQueueQueryOptions } from '../api/review-query-options';
import type { ReviewQueueFilters } from '../api/review-queue-filters';

export function useReviewQueue(filters: ReviewQueueFilters) {
  return useQuery(reviewQueueQueryOptions(useApiClient(), filters));
}
