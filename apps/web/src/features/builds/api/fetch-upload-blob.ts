import type { ApiClient } from '../../../lib/api-client';
import { apiErrorFrom, bearerToken, renewToken } from './authorized-request';

async function fetchWithToken(path: string, token: string | null, signal?: AbortSignal): Promise<Response> {
  return globalThis.fetch(path, {
    headers: token ? { Authorization: `Bearer ${token}` } : {},
    credentials: 'same-origin',
    signal,
  });
}

/** The bytes of an upload (`GET /api/uploads/:id/content`); it needs the bearer token, so no plain <img src>. */
export async function fetchUploadBlob(client: ApiClient, uploadId: string, signal?: AbortSignal): Promise<Blob> {
  const path = `/api/uploads/${encodeURIComponent(uploadId)}/content`;
  let response = await fetchWithToken(path, bearerToken(client), signal);
  if (response.status === 401 && (await renewToken(client))) {
    response = await fetchWithToken(path, bearerToken(client), signal);
  }
  if (!response.ok) throw apiErrorFrom(response.status, await response.text(), 'The photo could not be loaded.');
  return response.blob();
}
