import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import type { CreateUserInput } from '../api/create-user-input';
import { userKeys } from '../api/user-keys';
import { userSchema } from '../api/user-schema';

export function useCreateUser() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateUserInput) =>
      client.request('/api/users', { method: 'POST', body: input, schema: userSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
  });
}
