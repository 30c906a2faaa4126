import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import type { SaveShopRulesInput } from '../api/save-shop-rules-input';
import { conflictCurrentShopRules } from '../api/conflict-current-shop-rules';
import { shopRulesKeys } from '../api/shop-rules-keys';
import { shopRulesRecordSchema } from '../api/shop-rules-record-schema';

export function useSaveShopRules() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SaveShopRulesInput) =>
      client.request('/api/shop-rules', { method: 'PUT', body: input, schema: shopRulesRecordSchema }),
    onSuccess: (saved) => queryClient.setQueryData(shopRulesKeys.current(), saved),
    onError: (error) => {
      // A 409 carries the newer record: keep the cache in step with it.
      const current = conflictCurrentShopRules(error);
      if (current) queryClient.setQueryData(shopRulesKeys.current(), current);
    },
  });
}
