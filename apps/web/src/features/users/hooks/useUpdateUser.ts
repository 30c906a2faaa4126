import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import type { UpdateUserInput } from '../api/update-user-input';
import { userKeys } from '../api/user-keys';
import { userSchema } from '../api/user-schema';

export interface UpdateUserVariables {
  id: string;
  changes: UpdateUserInput;
}

export function useUpdateUser() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: UpdateUserVariables) =>
      client.request(`/api/users/${encodeURIComponent(id)}`, { method: 'PATCH', body: changes, schema: userSchema }),
    onSuccess: (user) => {
      queryClient.setQueryData(userKeys.detail(user.id), user);
      return queryClient.invalidateQueries({ queryKey: userKeys.lists() });
    },
    // A 409 means the lists show a stale row too.
    onError: () => queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
  });
}
