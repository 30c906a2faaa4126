import type { RevisionSummaryDto } from '../circuits/dto/circuit.dto.js';

/** The number of the latest signed-off revision (the one orders and exports work from), if any. */
export function approvedRevisionNumber(revisions: readonly RevisionSummaryDto[]): number | undefined {
  return revisions
    .filter((revision) => revision.approvedAt !== null)
    .reduce<number | undefined>((latest, revision) => (latest === undefined || revision.number > latest ? revision.number : latest), undefined);
}
