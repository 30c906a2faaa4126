import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Role } from '../../../lib/contract/role-schema';
import { useApiClient } from '../../../lib/useApiClient';
import { userKeys } from '../api/user-keys';
import { userSchema } from '../api/user-schema';

/** Body of `POST /api/users/invite`: the user sets a password from the e-mailed link. */
export interface InviteUserInput {
  email: string;
  displayName: string;
  roles: Role[];
}

export function useInviteUser() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteUserInput) =>
      client.request('/api/users/invite', { method: 'POST', body: input, schema: userSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.lists() }),
  });
}
