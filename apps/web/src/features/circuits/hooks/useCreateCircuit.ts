import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { buildKeys } from '../../builds/api/build-keys';
import { circuitKeys } from '../api/circuit-keys';
import { circuitSchema } from '../api/circuit-schema';
import type { CreateCircuitInput } from '../api/create-circuit-input';

export function useCreateCircuit(buildId: string) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateCircuitInput) =>
      client.request(`/api/builds/${encodeURIComponent(buildId)}/circuits`, { method: 'POST', body: input, schema: circuitSchema }),
    onSuccess: async (circuit) => {
      queryClient.setQueryData(circuitKeys.detail(circuit.id), circuit);
      // The build's circuit counts change with it.
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: circuitKeys.byBuild(buildId) }),
        queryClient.invalidateQueries({ queryKey: buildKeys.detail(buildId), exact: true }),
        queryClient.invalidateQueries({ queryKey: buildKeys.lists() }),
      ]);
    },
  });
}
