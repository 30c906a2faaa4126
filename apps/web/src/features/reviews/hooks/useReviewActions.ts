import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { useApiClient } from '../../../lib/useApiClient';
import { circuitKeys } from '../../circuits/api/circuit-keys';
import { circuitSchema } from '../../circuits/api/circuit-schema';
import { circuitPath } from '../api/review-query-options';
import { reviewKeys } from '../api/review-keys';

/** Every review action changes the queue, the review, the audit trail and the circuit's status. */
function useInvalidateReview(circuitId: string) {
  const queryClient = useQueryClient();
  return () =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: reviewKeys.all }),
      queryClient.invalidateQueries({ queryKey: circuitKeys.detail(circuitId) }),
    ]);
}

// The answers' bodies are not read: the review is fetched again after each action.
const anyAnswer = z.unknown();

export function useAcknowledgeFlag(circuitId: string) {
  const client = useApiClient();
  const invalidate = useInvalidateReview(circuitId);
  return useMutation({
    mutationFn: (input: { flagKey: string; note: string }) =>
      client.request(`${circuitPath(circuitId)}/review/acknowledgements`, { method: 'POST', body: input, schema: anyAnswer }),
    onSettled: invalidate,
  });
}

export function useApproveReview(circuitId: string) {
  const client = useApiClient();
  const invalidate = useInvalidateReview(circuitId);
  return useMutation({
    mutationFn: (input: { note?: string }) =>
      client.request(`${circuitPath(circuitId)}/review/approve`, { method: 'POST', body: input, schema: anyAnswer }),
    onSettled: invalidate,
  });
}

export function useReturnReview(circuitId: string) {
  const client = useApiClient();
  const invalidate = useInvalidateReview(circuitId);
  return useMutation({
    mutationFn: (input: { comments: string }) =>
      client.request(`${circuitPath(circuitId)}/review/return`, { method: 'POST', body: input, schema: anyAnswer }),
    onSettled: invalidate,
  });
}

/** The fabricator hands the working draft to the reviewer; the server saves it as a revision. */
export function useSubmitCircuit(circuitId: string) {
  const client = useApiClient();
  const queryClient = useQueryClient();
  const invalidate = useInvalidateReview(circuitId);
  return useMutation({
    mutationFn: (input: { message?: string }) =>
      client.request(`${circuitPath(circuitId)}/submit`, { method: 'POST', body: input, schema: circuitSchema }),
    onSuccess: (circuit) => queryClient.setQueryData(circuitKeys.detail(circuit.id), circuit),
    onSettled: () => Promise.all([invalidate(), queryClient.invalidateQueries({ queryKey: circuitKeys.revisions(circuitId) })]),
  });
}
