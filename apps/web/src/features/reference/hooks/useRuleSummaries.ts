import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { rulesQueryOptions } from '../api/rules-query-options';

export function useRuleSummaries() {
  return useQuery(rulesQueryOptions(useApiClient()));
}
