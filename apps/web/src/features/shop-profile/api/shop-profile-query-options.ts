import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { shopProfileKeys } from './shop-profile-keys';
import { shopProfileSchema } from './shop-profile-schema';

export function shopProfileQueryOptions(client: ApiClient) {
  return queryOptions({
    queryKey: shopProfileKeys.current(),
    queryFn: ({ signal }) => client.request('/api/shop', { schema: shopProfileSchema, signal }),
  });
}
