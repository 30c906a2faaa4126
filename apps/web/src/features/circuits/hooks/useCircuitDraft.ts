import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { circuitDraftQueryOptions } from '../api/circuit-query-options';

export function useCircuitDraft(id: string) {
  return useQuery(circuitDraftQueryOptions(useApiClient(), id));
}
