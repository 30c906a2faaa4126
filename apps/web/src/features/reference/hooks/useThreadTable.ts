import type { Family } from '@linesmith/catalog';
import { skipToken, useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { threadTableQueryOptions } from '../api/thread-table-query-options';

/** The thread table of one family; idle until a family is chosen. */
export function useThreadTable(family: Family | null) {
  const options = threadTableQueryOptions(useApiClient(), family ?? 'flare37');
  return useQuery(family ? options : { ...options, queryFn: skipToken });
}
