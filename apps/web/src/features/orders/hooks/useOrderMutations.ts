import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { catalogueKeys } from '../../catalogue/api/catalogue-keys';
import { orderKeys } from '../api/order-keys';
import { draftOrdersSchema, orderSchema, type ReceiveInput } from '../api/order-schema';

export function useDraftOrders() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (circuitIds: string[]) =>
      client.request('/api/orders/draft', { method: 'POST', body: { circuitIds }, schema: draftOrdersSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: orderKeys.all }),
  });
}

export function useSendOrder(id: string) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () =>
      client.request(`/api/orders/${encodeURIComponent(id)}/send`, { method: 'POST', schema: orderSchema.optional() }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: orderKeys.all }),
  });
}

export interface ReceiveRequest {
  input: ReceiveInput;
  /** One per receipt the clerk books: resending it (a retry, a double click) books nothing twice. */
  idempotencyKey: string;
}

/** Booking a receipt puts parts into stock, so the catalogue's stock figures are refetched too. */
export function useReceiveOrder(id: string) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ input, idempotencyKey }: ReceiveRequest) =>
      client.request(`/api/orders/${encodeURIComponent(id)}/receive`, {
        method: 'POST',
        body: input,
        headers: { 'Idempotency-Key': idempotencyKey },
        schema: orderSchema.optional(),
      }),
    onSettled: async () => {
      await queryClient.invalidateQueries({ queryKey: orderKeys.all });
      await queryClient.invalidateQueries({ queryKey: catalogueKeys.parts() });
    },
  });
}
