import type { ThreadReading } from '@linesmith/catalog';
import { z } from 'zod';
import type { ApiClient } from '../../../lib/api-client';
import { threadCandidateSchema } from './thread-candidate-schema';

/** `POST /api/reference/identify`: candidate threads for a bench reading, best first. */
export function identifyThreadRequest(client: ApiClient, reading: ThreadReading, signal?: AbortSignal) {
  return client.request('/api/reference/identify', {
    method: 'POST',
    body: reading,
    schema: z.array(threadCandidateSchema),
    signal,
  });
}
