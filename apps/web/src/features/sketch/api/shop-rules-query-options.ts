import { shopRulesSchema } from '@linesmith/routing';
import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import type { ApiClient } from '../../../lib/api-client';
import { sketchKeys } from './sketch-keys';

const shopRulesBodySchema = z.looseObject({ rules: shopRulesSchema });

/** The shop's thresholds the rules engine uses (`GET /api/shop-rules`). */
export function shopRulesQueryOptions(client: ApiClient) {
  return queryOptions({
    queryKey: sketchKeys.shopRules(),
    queryFn: async ({ signal }) => (await client.request('/api/shop-rules', { schema: shopRulesBodySchema, signal })).rules,
    staleTime: 5 * 60_000,
  });
}
