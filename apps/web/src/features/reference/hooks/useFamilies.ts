import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { familiesQueryOptions } from '../api/families-query-options';

export function useFamilies() {
  return useQuery(familiesQueryOptions(useApiClient()));
}
