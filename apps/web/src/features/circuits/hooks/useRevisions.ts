import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { revisionsQueryOptions } from '../api/circuit-query-options';

export function useRevisions(id: string) {
  return useQuery(revisionsQueryOptions(useApiClient(), id));
}
