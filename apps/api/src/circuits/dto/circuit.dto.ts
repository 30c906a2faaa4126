import type { Fluid } from '@linesmith/catalog';
import type { CircuitDocument, CircuitKind } from '@linesmith/routing';
import type { CircuitStatus } from '../circuit-status.js';
import type { UserRefDto } from '../../users/user-ref.js';

export interface CircuitDto {
  id: string;
  buildId: string;
  name: string;
  kind: CircuitKind;
  fluid: Fluid;
  maxPressurePsi: number;
  maxTempF: number;
  status: CircuitStatus;
  draftVersion: number;
  version: number;
  createdAt: string;
  updatedAt: string;
}

export interface DraftDto {
  document: CircuitDocument;
  draftVersion: number;
}

export interface RevisionSummaryDto {
  id: string;
  circuitId: string;
  number: number;
  message: string;
  authorId: string | null;
  /** Null once the account is gone. */
  author: UserRefDto | null;
  /** The draft version the snapshot was taken from. */
  draftVersion: number;
  createdAt: string;
  /** Set when a reviewer signed this revision off; a locked revision never changes. */
  lockedAt: string | null;
  approvedById: string | null;
  approvedAt: string | null;
}

export interface RevisionDto extends RevisionSummaryDto {
  document: CircuitDocument;
}
