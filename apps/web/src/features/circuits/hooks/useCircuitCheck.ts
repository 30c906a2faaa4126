import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { circuitCheckQueryOptions } from '../api/circuit-query-options';

export function useCircuitCheck(id: string) {
  return useQuery(circuitCheckQueryOptions(useApiClient(), id));
}
