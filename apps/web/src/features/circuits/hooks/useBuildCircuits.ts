import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { buildCircuitsQueryOptions } from '../api/circuit-query-options';

export function useBuildCircuits(buildId: string) {
  return useQuery(buildCircuitsQueryOptions(useApiClient(), buildId));
}
