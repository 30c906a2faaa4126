import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import type { ApiClient } from '../../../lib/api-client';
import { referenceKeys } from './reference-keys';
import { ruleSummarySchema } from './rule-summary-schema';

export function rulesQueryOptions(client: ApiClient) {
  return queryOptions({
    queryKey: referenceKeys.rules(),
    queryFn: ({ signal }) => client.request('/api/reference/rules', { schema: z.array(ruleSummarySchema), signal }),
    staleTime: Infinity,
  });
}
