import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { catalogueKeys } from '../api/catalogue-keys';
import { partRecordSchema } from '../api/part-record-schema';

/** `id` absent: POST a new part; present: PATCH the changes against `version` (409 carries the current part). */
export interface SavePartVariables {
  id?: string;
  body: Record<string, unknown>;
}

export function useSavePart() {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, body }: SavePartVariables) =>
      id
        ? client.request(`/api/parts/${encodeURIComponent(id)}`, { method: 'PATCH', body, schema: partRecordSchema })
        : client.request('/api/parts', { method: 'POST', body, schema: partRecordSchema }),
    onSettled: () => queryClient.invalidateQueries({ queryKey: catalogueKeys.parts() }),
  });
}
