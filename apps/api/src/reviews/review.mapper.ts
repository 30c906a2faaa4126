import type { BuildEntity } from '../builds/build.entity.js';
import type { ReviewAcknowledgementEntity } from './review-acknowledgement.entity.js';
import type { ReviewEntity } from './review.entity.js';
import type { AcknowledgementDto, ReviewDecisionDto, ReviewQueueRowDto } from './dto/review.dto.js';
import { toUserRef } from '../users/user-ref.js';

export { toUserRef };

/** "1974 Redfern Pickup — J. Doe": the vehicle as typed, then the customer; either may be blank. */
export function buildLabel(build: Pick<BuildEntity, 'vehicleYear' | 'vehicleMake' | 'vehicleModel' | 'customerName'>): string {
  const vehicle = [build.vehicleYear, build.vehicleMake, build.vehicleModel].map((part) => part.trim()).filter(Boolean).join(' ');
  const customer = build.customerName.trim();
  return [vehicle, customer].filter(Boolean).join(' — ') || 'Untitled build';
}

/** Needs `circuit.build` and `submittedBy` joined. */
export function toQueueRow(review: ReviewEntity): ReviewQueueRowDto {
  const circuit = review.circuit!;
  const build = circuit.build!;
  return {
    reviewId: review.id,
    circuitId: review.circuitId,
    circuitName: circuit.name,
    build: { id: build.id, label: buildLabel(build) },
    fabricator: toUserRef(review.submittedBy),
    revisionNumber: review.revisionNumber,
    status: review.status,
    submittedAt: review.submittedAt.toISOString(),
    blockers: review.blockers,
    cautions: review.cautions,
  };
}

/** Needs `by` joined. */
export function toAcknowledgementDto(ack: ReviewAcknowledgementEntity): AcknowledgementDto {
  return { flagKey: ack.flagKey, note: ack.note, by: toUserRef(ack.by), at: ack.createdAt.toISOString() };
}

/** Needs `decidedBy` joined. */
export function toDecisionDto(review: ReviewEntity): ReviewDecisionDto | undefined {
  if (review.status === 'in-review' || !review.decidedAt) return undefined;
  const by = toUserRef(review.decidedBy);
  const at = review.decidedAt.toISOString();
  return review.status === 'approved'
    ? { kind: 'approved', by, at, note: review.decisionNote ?? '' }
    : { kind: 'returned', by, at, comments: review.decisionNote ?? '' };
}
