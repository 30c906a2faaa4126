import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { useApiClient } from '../../../lib/useApiClient';
import { conflictCurrentShopProfile } from '../api/conflict-current-shop-profile';
import { shopProfileKeys } from '../api/shop-profile-keys';
import { shopProfileSchema, type SaveShopProfileInput } from '../api/shop-profile-schema';

/** The top bar shows the shop name from the session's `me`: read `me` again when it is out of date. */
async function syncSessionShopName(client: ApiClient, name: string): Promise<void> {
  const session = client.getSession();
  if (session.status !== 'signed-in' || session.user.shop.name === name) return;
  try {
    await client.reloadMe();
  } catch {
    // The save itself succeeded; the top bar catches up at the next session refresh.
  }
}

export function useSaveShopProfile() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SaveShopProfileInput) =>
      client.request('/api/shop', { method: 'PATCH', body: input, schema: shopProfileSchema }),
    onSuccess: async (saved) => {
      queryClient.setQueryData(shopProfileKeys.current(), saved);
      await syncSessionShopName(client, saved.name);
    },
    onError: async (error) => {
      // A 409 carries the newer profile: keep the cache (and a renamed shop in the top bar) in step with it.
      const current = conflictCurrentShopProfile(error);
      if (!current) return;
      queryClient.setQueryData(shopProfileKeys.current(), current);
      await syncSessionShopName(client, current.name);
    },
  });
}
