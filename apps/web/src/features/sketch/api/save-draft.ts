import type { CircuitDocument } from '@linesmith/routing';
import { z } from 'zod';
import type { ApiClient } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import { apiErrorFrom, bearerToken, renewToken } from '../../builds/api/authorized-request';
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

async function put(path: string, token: string | null, version: number, document: CircuitDocument): Promise<Response> {
  const headers: Record<string, string> = {
    Accept: 'application/json',
    'Content-Type': 'application/json',
    'If-Match': `"${version}"`,
  };
  if (token) headers.Authorization = `Bearer ${token}`;
  try {
    return await globalThis.fetch(path, { method: 'PUT', headers, body: JSON.stringify(document), credentials: 'same-origin' });
  } catch {
    throw new ApiError({ status: 0, code: 'network_error', message: 'Linesmith could not reach the server.' });
  }
}

/**
 * `PUT /api/circuits/:id/draft` with `If-Match: <draftVersion>` (compare-and-set). The JSON client
 * sends no custom headers, so this goes through fetch with the session's token like the photo
 * requests do. Throws DraftConflictError on 409 and ApiError otherwise.
 */
export async function saveDraft(client: ApiClient, circuitId: string, version: number, document: CircuitDocument): Promise<number> {
  const path = `/api/circuits/${encodeURIComponent(circuitId)}/draft`;
  let response = await put(path, bearerToken(client), version, document);
  if (response.status === 401 && (await renewToken(client))) response = await put(path, bearerToken(client), version, document);
  const text = await response.text();
  if (response.ok) return savedSchema.parse(JSON.parse(text)).draftVersion;
  const error = apiErrorFrom(response.status, text, 'The sketch could not be saved.');
  if (response.status === 409) {
    const conflict = conflictSchema.safeParse(error.body);
    if (conflict.success) throw new DraftConflictError(error.message, conflict.data.current);
  }
  throw error;
}
