import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { suppliersQueryOptions } from '../api/suppliers-query-options';

export function useSuppliers(includeInactive = false) {
  return useQuery(suppliersQueryOptions(useApiClient(), includeInactive));
}
