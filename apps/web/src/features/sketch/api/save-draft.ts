import type { CircuitDocument } from '@linesmith/routing';
import { z } from 'zod';
import type { ApiClient } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import { circuitDraftSchema, type CircuitDraft } from '../../circuits/api/draft-schema';

const savedSchema = z.object({ draftVersion: z.number().int() });
const conflictSchema = z.looseObject({ current: circuitDraftSchema });

/** The server holds a newer draft than the one edited: it comes along so nothing is lost. */
export class DraftConflictError extends Error {
  readonly current: CircuitDraft;
  constructor(message: string, current: CircuitDraft) {
    super(message);
    this.name = 'DraftConflictError';
    this.current = current;
  }
}

/**
 * `PUT /api/circuits/:id/draft` with `If-Match: "<draftVersion>"` (compare-and-set). Throws
 * DraftConflictError on 409 and ApiError otherwise.
 */
export async function saveDraft(client: ApiClient, circuitId: string, version: number, document: CircuitDocument): Promise<number> {
  try {
    const saved = await client.request(`/api/circuits/${encodeURIComponent(circuitId)}/draft`, {
      method: 'PUT',
      body: document,
      headers: { 'If-Match': `"${version}"` },
      schema: savedSchema,
    });
    return saved.draftVersion;
  } catch (error) {
    if (error instanceof ApiError && error.status === 409) {
      const conflict = conflictSchema.safeParse(error.body);
      if (conflict.success) throw new DraftConflictError(error.message, conflict.data.current);
    }
    throw error;
  }
}
