import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import type { CreateBuildInput } from '../api/build-input';
import { buildKeys } from '../api/build-keys';
import { buildSchema } from '../api/build-schema';

export function useCreateBuild() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateBuildInput) =>
      client.request('/api/builds', { method: 'POST', body: input, schema: buildSchema }),
    onSuccess: (build) => {
      queryClient.setQueryData(buildKeys.detail(build.id), build);
      return queryClient.invalidateQueries({ queryKey: buildKeys.lists() });
    },
  });
}
