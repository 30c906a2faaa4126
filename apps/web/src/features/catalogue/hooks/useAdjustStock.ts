import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { useApiClient } from '../../../lib/useApiClient';
import { catalogueKeys } from '../api/catalogue-keys';
import type { StockAdjustmentInput } from '../api/stock-adjustment-schema';

export function useAdjustStock(partId: string) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: StockAdjustmentInput) =>
      client.request(`/api/parts/${encodeURIComponent(partId)}/stock-adjustments`, {
        method: 'POST',
        body: input,
        schema: z.unknown(),
      }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.parts() }),
  });
}
