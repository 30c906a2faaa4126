import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { stockHistoryQueryOptions } from '../api/stock-history-query-options';

export function useStockHistory(partId: string) {
  return useQuery(stockHistoryQueryOptions(useApiClient(), partId));
}
