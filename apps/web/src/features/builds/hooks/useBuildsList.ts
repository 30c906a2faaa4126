import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import type { BuildListFilters } from '../api/build-list-filters';
import { buildsListQueryOptions } from '../api/builds-list-query-options';

export function useBuildsList(filters: BuildListFilters) {
  return useQuery(buildsListQueryOptions(useApiClient(), filters));
}
