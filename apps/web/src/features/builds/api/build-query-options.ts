import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { buildKeys } from './build-keys';
import { buildSchema } from './build-schema';

export function buildQueryOptions(client: ApiClient, id: string) {
  return queryOptions({
    queryKey: buildKeys.detail(id),
    queryFn: ({ signal }) => client.request(`/api/builds/${encodeURIComponent(id)}`, { schema: buildSchema, signal }),
  });
}
