import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { catalogueKeys } from './catalogue-keys';
import type { PartListFilters } from './part-list-filters';
import { partPageSchema } from './part-record-schema';

export function partsListQueryParams(filters: PartListFilters): URLSearchParams {
  const params = new URLSearchParams({ page: String(filters.page), pageSize: String(filters.pageSize) });
  if (filters.kind) params.set('kind', filters.kind);
  if (filters.family) params.set('family', filters.family);
  if (filters.dash.trim()) params.set('dash', filters.dash.trim());
  if (filters.supplierId) params.set('supplierId', filters.supplierId);
  if (filters.search.trim()) params.set('search', filters.search.trim());
  if (filters.includeRetired) params.set('includeRetired', 'true');
  return params;
}

export function partsListQueryOptions(client: ApiClient, filters: PartListFilters) {
  const params = partsListQueryParams(filters);
  return queryOptions({
    queryKey: catalogueKeys.partList(filters),
    queryFn: ({ signal }) => client.request(`/api/parts?${params.toString()}`, { schema: partPageSchema, signal }),
    placeholderData: keepPreviousData,
  });
}
