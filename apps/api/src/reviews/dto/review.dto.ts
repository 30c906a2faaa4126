import type { CircuitDocument, CircuitEvaluation, DocumentComparison } from '@linesmith/routing';
import type { CircuitStatus } from '../../circuits/circuit-status.js';
import type { OpenItems } from '../open-items.js';
import type { ReviewStatus } from '../review-status.js';
import type { DocumentRef } from './review-input.schemas.js';
import type { UserRefDto } from '../../users/user-ref.js';

export type { UserRefDto } from '../../users/user-ref.js';

export interface ReviewQueueRowDto {
  reviewId: string;
  circuitId: string;
  circuitName: string;
  build: { id: string; label: string };
  fabricator: UserRefDto | null;
  revisionNumber: number;
  status: ReviewStatus;
  submittedAt: string;
  /** Counts of the server's check at submission. */
  blockers: number;
  cautions: number;
}

export interface AcknowledgementDto {
  flagKey: string;
  note: string;
  by: UserRefDto | null;
  at: string;
}

export type ReviewDecisionDto =
  | { kind: 'approved'; by: UserRefDto | null; at: string; note: string }
  | { kind: 'returned'; by: UserRefDto | null; at: string; comments: string };

export interface ReviewDto {
  reviewId: string;
  circuitId: string;
  /** The review's own status; `circuitStatus` moves on (ordered, installed) after approval. */
  status: ReviewStatus;
  circuitStatus: CircuitStatus;
  revisionNumber: number;
  message: string;
  document: CircuitDocument;
  /** The server's check of the revision, run now. */
  evaluation: CircuitEvaluation;
  acknowledgements: AcknowledgementDto[];
  /** Present once the review is decided. */
  decision?: ReviewDecisionDto;
  submittedBy: UserRefDto | null;
  submittedAt: string;
  /** What still stands between this revision and its sign-off (empty lists: it can be approved). */
  openItems: OpenItems;
}

export interface ComparisonSideDto {
  ref: DocumentRef;
  document: CircuitDocument;
  evaluation: CircuitEvaluation;
}

export interface CircuitComparisonDto {
  comparison: DocumentComparison;
  before: ComparisonSideDto;
  after: ComparisonSideDto;
}
