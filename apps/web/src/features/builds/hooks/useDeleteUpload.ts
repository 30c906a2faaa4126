import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { useApiClient } from '../../../lib/useApiClient';
import { buildKeys } from '../api/build-keys';

export function useDeleteUpload(buildId: string) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (uploadId: string) =>
      client.request(`/api/uploads/${encodeURIComponent(uploadId)}`, { method: 'DELETE', schema: z.unknown() }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: buildKeys.uploads(buildId) }),
  });
}
