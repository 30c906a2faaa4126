import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { circuitQueryOptions } from '../api/circuit-query-options';

export function useCircuit(id: string) {
  return useQuery(circuitQueryOptions(useApiClient(), id));
}
