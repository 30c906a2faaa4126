import type { ThreadReading } from '@linesmith/catalog';
import { z } from 'zod';
import type { ApiClient } from '../../../lib/api-client';
import { threadCandidateSchema } from './thread-candidate-schema';

const identifyResultSchema = z.object({ candidates: z.array(threadCandidateSchema) });

/** `POST /api/reference/identify`: candidate threads for a bench reading, best first. */
export async function identifyThreadRequest(client: ApiClient, reading: ThreadReading, signal?: AbortSignal) {
  const { candidates } = await client.request('/api/reference/identify', {
    method: 'POST',
    body: reading,
    schema: identifyResultSchema,
    signal,
  });
  return candidates;
}
