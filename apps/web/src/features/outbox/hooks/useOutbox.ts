import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { outboxQueryOptions } from '../api/outbox-query-options';

export function useOutbox() {
  return useQuery(outboxQueryOptions(useApiClient()));
}
