import type { ApiClient } from '../../../lib/api-client';
import { revisionSchema } from '../../circuits/api/revision-schema';

/** "Save version": `POST /api/circuits/:id/revisions` snapshots the server's current draft. */
export function createRevision(client: ApiClient, circuitId: string, message: string) {
  return client.request(`/api/circuits/${encodeURIComponent(circuitId)}/revisions`, {
    method: 'POST',
    body: { message },
    schema: revisionSchema,
  });
}
