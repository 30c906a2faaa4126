import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import type { ApiClient } from '../../../lib/api-client';
import { familyOptionSchema } from './family-option-schema';
import { referenceKeys } from './reference-keys';

export function familiesQueryOptions(client: ApiClient) {
  return queryOptions({
    queryKey: referenceKeys.families(),
    queryFn: ({ signal }) =>
      client.request('/api/reference/families', { schema: z.array(familyOptionSchema), signal }),
    staleTime: Infinity,
  });
}
