import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { buildQueryOptions } from '../api/build-query-options';

export function useBuild(id: string) {
  return useQuery(buildQueryOptions(useApiClient(), id));
}
