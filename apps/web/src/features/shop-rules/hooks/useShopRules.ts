import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { shopRulesQueryOptions } from '../api/shop-rules-query-options';

export function useShopRules() {
  return useQuery(shopRulesQueryOptions(useApiClient()));
}
