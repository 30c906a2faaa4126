import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import type { RevisionRef } from '../api/comparison-schema';
import { comparisonQueryOptions } from '../api/review-query-options';

export function useComparison(circuitId: string, from: RevisionRef, to: RevisionRef) {
  return useQuery(comparisonQueryOptions(useApiClient(), circuitId, from, to));
}
