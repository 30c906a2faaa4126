import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { orderKeys } from './order-keys';
import { orderListSchema, orderSchema } from './order-schema';

export function ordersListQueryOptions(client: ApiClient) {
  return queryOptions({
    queryKey: orderKeys.list(),
    queryFn: ({ signal }) => client.request('/api/orders', { schema: orderListSchema, signal }),
  });
}

export function orderQueryOptions(client: ApiClient, id: string) {
  return queryOptions({
    queryKey: orderKeys.detail(id),
    queryFn: ({ signal }) => client.request(`/api/orders/${encodeURIComponent(id)}`, { schema: orderSchema, signal }),
  });
}
