import type { CircuitDocument } from '@linesmith/routing';
import { queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { evaluationSchema } from '../../reviews/api/evaluation-schema';

export const sheetKeys = {
  evaluation: (circuitId: string, revision: number) => ['shop-sheet', circuitId, revision, 'evaluation'] as const,
};

/** The revision's cut lengths, stacks and flags, worked out by the rules module on the server. */
export function sheetEvaluationQueryOptions(client: ApiClient, circuitId: string, revision: number, document: CircuitDocument | undefined) {
  return queryOptions({
    queryKey: sheetKeys.evaluation(circuitId, revision),
    queryFn: ({ signal }) => client.request('/api/rules/evaluate', { method: 'POST', body: document, schema: evaluationSchema, signal }),
    enabled: document !== undefined,
  });
}
