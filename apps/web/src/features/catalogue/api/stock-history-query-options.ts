import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { catalogueKeys } from './catalogue-keys';
import { stockHistorySchema } from './stock-adjustment-schema';

export function stockHistoryQueryOptions(client: ApiClient, partId: string) {
  return queryOptions({
    queryKey: catalogueKeys.stockHistory(partId),
    queryFn: ({ signal }) =>
      client.request(`/api/parts/${encodeURIComponent(partId)}/stock-adjustments`, { schema: stockHistorySchema, signal }),
  });
}
