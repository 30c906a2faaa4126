import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { catalogueKeys } from '../api/catalogue-keys';
import { supplierSchema, type SupplierInput } from '../api/supplier-schema';

export interface SaveSupplierVariables {
  id?: string;
  body: Partial<SupplierInput> & { version?: number };
}

export function useSaveSupplier() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: SaveSupplierVariables) =>
      id
        ? client.request(`/api/suppliers/${encodeURIComponent(id)}`, { method: 'PATCH', body, schema: supplierSchema })
        : client.request('/api/suppliers', { method: 'POST', body, schema: supplierSchema }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.suppliers() }),
  });
}
