import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { auditTrailQueryOptions, circuitReviewQueryOptions } from '../api/review-query-options';

/** The submitted revision under review, its flags and the reviewer's acknowledgements and decision. */
export function useCircuitReview(circuitId: string) {
  return useQuery(circuitReviewQueryOptions(useApiClient(), circuitId));
}

export function useAuditTrail(circuitId: string) {
  return useQuery(auditTrailQueryOptions(useApiClient(), circuitId));
}
