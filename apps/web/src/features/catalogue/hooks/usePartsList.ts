import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import type { PartListFilters } from '../api/part-list-filters';
import { partsListQueryOptions } from '../api/parts-list-query-options';

export function usePartsList(filters: PartListFilters) {
  return useQuery(partsListQueryOptions(useApiClient(), filters));
}
