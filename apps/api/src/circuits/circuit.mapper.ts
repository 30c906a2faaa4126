import type { CircuitRevisionEntity } from './circuit-revision.entity.js';
import type { CircuitEntity } from './circuit.entity.js';
import { readStoredDocument } from './circuit-document.js';
import type { CircuitDto, RevisionDto, RevisionSummaryDto } from './dto/circuit.dto.js';
import { toUserRef } from '../users/user-ref.js';

export function toCircuitDto(circuit: CircuitEntity): CircuitDto {
  return {
    id: circuit.id,
    buildId: circuit.buildId,
    name: circuit.name,
    kind: circuit.kind,
    fluid: circuit.fluid,
    maxPressurePsi: circuit.maxPressurePsi,
    maxTempF: circuit.maxTempF,
    status: circuit.status,
    draftVersion: circuit.draftVersion,
    version: circuit.version,
    createdAt: circuit.createdAt.toISOString(),
    updatedAt: circuit.updatedAt.toISOString(),
  };
}

/** Needs `author` joined to name the author. */
export function toRevisionSummaryDto(revision: CircuitRevisionEntity): RevisionSummaryDto {
  return {
    id: revision.id,
    circuitId: revision.circuitId,
    number: revision.number,
    message: revision.message,
    authorId: revision.authorId,
    author: toUserRef(revision.author),
    draftVersion: revision.draftVersion,
    createdAt: revision.createdAt.toISOString(),
    lockedAt: revision.lockedAt?.toISOString() ?? null,
    approvedById: revision.approvedById ?? null,
    approvedAt: revision.approvedAt?.toISOString() ?? null,
  };
}

export function toRevisionDto(revision: CircuitRevisionEntity): RevisionDto {
  return { ...toRevisionSummaryDto(revision), document: readStoredDocument(revision.document) };
}
