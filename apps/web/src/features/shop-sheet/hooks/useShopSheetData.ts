import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import { useBuild } from '../../builds/hooks/useBuild';
import { revisionQueryOptions } from '../../circuits/api/circuit-query-options';
import { useCircuit } from '../../circuits/hooks/useCircuit';
import { useParts } from '../../circuits/hooks/useParts';
import { useAuditTrail } from '../../reviews/hooks/useCircuitReview';
import { isApproval } from '../../reviews/utils/audit-text';
import { sheetEvaluationQueryOptions } from '../api/sheet-query-options';

/** Everything the shop sheet prints: circuit, build, the revision and its check, parts, and the sign-off. */
export function useShopSheetData(circuitId: string, revision: number) {
  const client = useApiClient();
  const circuit = useCircuit(circuitId);
  const build = useBuild(circuit.data?.buildId ?? '');
  const saved = useQuery(revisionQueryOptions(client, circuitId, revision));
  const evaluation = useQuery(sheetEvaluationQueryOptions(client, circuitId, revision, saved.data?.document));
  const audit = useAuditTrail(circuitId);
  const lines = saved.data?.document.lines ?? [];
  const parts = useParts(lines.flatMap((l) => [...(l.hosePartId ? [l.hosePartId] : []), ...l.endStacks.from, ...l.endStacks.to]));
  const signOff = audit.data?.filter((e) => isApproval(e) && e.revisionNumber === revision).at(-1) ?? null;
  return { circuit, build, saved, evaluation, audit, parts, signOff };
}
