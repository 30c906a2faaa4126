import type { Family } from '@linesmith/catalog';
import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { referenceKeys } from './reference-keys';
import { oneFamilyTablesSchema } from './thread-table-schema';

export function threadTableQueryOptions(client: ApiClient, family: Family) {
  const params = new URLSearchParams({ family });
  return queryOptions({
    queryKey: referenceKeys.threadTable(family),
    queryFn: ({ signal }) =>
      client.request(`/api/reference/threads?${params.toString()}`, { schema: oneFamilyTablesSchema, signal }),
    staleTime: Infinity,
  });
}
