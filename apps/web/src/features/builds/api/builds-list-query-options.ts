import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { buildKeys } from './build-keys';
import type { BuildListFilters } from './build-list-filters';
import { buildPageSchema } from './build-page-schema';

export function buildsListQueryOptions(client: ApiClient, filters: BuildListFilters) {
  const params = new URLSearchParams({
    sort: filters.sort,
    direction: filters.direction,
    page: String(filters.page),
    pageSize: String(filters.pageSize),
  });
  if (filters.search.trim()) params.set('search', filters.search.trim());
  if (filters.status) params.set('status', filters.status);
  return queryOptions({
    queryKey: buildKeys.list(filters),
    queryFn: ({ signal }) => client.request(`/api/builds?${params.toString()}`, { schema: buildPageSchema, signal }),
    placeholderData: keepPreviousData,
  });
}
