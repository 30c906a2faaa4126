import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { catalogueKeys } from './catalogue-keys';
import { supplierListSchema } from './supplier-schema';

export function suppliersQueryOptions(client: ApiClient, includeInactive = false) {
  const query = includeInactive ? '?includeInactive=true' : '';
  return queryOptions({
    queryKey: catalogueKeys.supplierList(includeInactive),
    queryFn: ({ signal }) => client.request(`/api/suppliers${query}`, { schema: supplierListSchema, signal }),
  });
}
