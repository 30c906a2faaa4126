import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { approvedCircuitsQueryOptions } from '../api/approved-circuits-query-options';
import { orderQueryOptions, ordersListQueryOptions } from '../api/order-query-options';

export function useOrdersList() {
  return useQuery(ordersListQueryOptions(useApiClient()));
}

export function useOrder(id: string) {
  return useQuery(orderQueryOptions(useApiClient(), id));
}

export function useApprovedCircuits(enabled: boolean) {
  return useQuery({ ...approvedCircuitsQueryOptions(useApiClient()), enabled });
}
