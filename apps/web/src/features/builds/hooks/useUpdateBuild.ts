import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import type { UpdateBuildInput } from '../api/build-input';
import { buildKeys } from '../api/build-keys';
import { buildSchema } from '../api/build-schema';
import { conflictCurrentBuild } from '../api/conflict-current-build';

export interface UpdateBuildVariables {
  id: string;
  changes: UpdateBuildInput;
}

export function useUpdateBuild() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: UpdateBuildVariables) =>
      client.request(`/api/builds/${encodeURIComponent(id)}`, { method: 'PATCH', body: changes, schema: buildSchema }),
    onSuccess: (build) => {
      queryClient.setQueryData(buildKeys.detail(build.id), build);
      return queryClient.invalidateQueries({ queryKey: buildKeys.lists() });
    },
    onError: (error, { id }) => {
      // A 409 carries the current row: the build page shows it at once.
      const current = conflictCurrentBuild(error);
      if (current) queryClient.setQueryData(buildKeys.detail(id), current);
      return queryClient.invalidateQueries({ queryKey: buildKeys.lists() });
    },
  });
}
