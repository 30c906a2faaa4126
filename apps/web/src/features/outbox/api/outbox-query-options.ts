import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { outboxSchema } from './outbox-schema';

export const outboxKeys = { all: ['outbox'] as const };

export function outboxQueryOptions(client: ApiClient) {
  return queryOptions({
    queryKey: outboxKeys.all,
    queryFn: ({ signal }) => client.request('/api/outbox', { schema: outboxSchema, signal }),
  });
}
