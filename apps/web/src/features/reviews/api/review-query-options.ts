import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { comparisonResultSchema, type RevisionRef } from './comparison-schema';
import { reviewKeys } from './review-keys';
import type { ReviewQueueFilters } from './review-queue-filters';
import { auditTrailSchema, circuitReviewSchema, reviewQueueSchema } from './review-schemas';

export const circuitPath = (id: string) => `/api/circuits/${encodeURIComponent(id)}`;

export function reviewQueueQueryOptions(client: ApiClient, filters: ReviewQueueFilters) {
  const query = new URLSearchParams({ status: filters.status, sort: filters.sort });
  return queryOptions({
    queryKey: reviewKeys.queue(filters),
    queryFn: ({ signal }) => client.request(`/api/reviews?${query}`, { schema: reviewQueueSchema, signal }),
  });
}

export function circuitReviewQueryOptions(client: ApiClient, circuitId: string) {
  return queryOptions({
    queryKey: reviewKeys.review(circuitId),
    queryFn: ({ signal }) => client.request(`${circuitPath(circuitId)}/review`, { schema: circuitReviewSchema, signal }),
  });
}

export function auditTrailQueryOptions(client: ApiClient, circuitId: string) {
  return queryOptions({
    queryKey: reviewKeys.audit(circuitId),
    queryFn: ({ signal }) => client.request(`${circuitPath(circuitId)}/audit`, { schema: auditTrailSchema, signal }),
  });
}

export function comparisonQueryOptions(client: ApiClient, circuitId: string, from: RevisionRef, to: RevisionRef) {
  const query = new URLSearchParams({ from: String(from), to: String(to) });
  return queryOptions({
    queryKey: reviewKeys.comparison(circuitId, String(from), String(to)),
    queryFn: ({ signal }) => client.request(`${circuitPath(circuitId)}/compare?${query}`, { schema: comparisonResultSchema, signal }),
  });
}
