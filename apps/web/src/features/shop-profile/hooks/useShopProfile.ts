import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { shopProfileQueryOptions } from '../api/shop-profile-query-options';

export function useShopProfile() {
  return useQuery(shopProfileQueryOptions(useApiClient()));
}
