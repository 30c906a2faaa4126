import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { shopRulesKeys } from './shop-rules-keys';
import { shopRulesRecordSchema } from './shop-rules-record-schema';

export function shopRulesQueryOptions(client: ApiClient) {
  return queryOptions({
    queryKey: shopRulesKeys.current(),
    queryFn: ({ signal }) => client.request('/api/shop-rules', { schema: shopRulesRecordSchema, signal }),
  });
}
