/**
 * Raw-request helpers kept for the order-sheet download and the catalogue multipart posts; new
 * code uses the shared client (`requestBlob`, `withAuthorization`, `headers`) instead.
 */
import type { ApiClient } from '../../../lib/api-client';
import { apiErrorFromText } from '../../../lib/api-error';
import { meSchema } from '../../../lib/contract/me-schema';

/** The access token of the signed-in session, for the requests the JSON client cannot make (multipart, bytes). */
export function bearerToken(client: ApiClient): string | null {
  const session = client.getSession();
  return session.status === 'signed-in' ? session.accessToken : null;
}

/**
 * After a 401 on a raw request: one cheap JSON call lets the client refresh the session the
 * usual single-flight way; true when a (new) token is there to retry with.
 */
export async function renewToken(client: ApiClient): Promise<boolean> {
  try {
    await client.request('/api/me', { schema: meSchema });
    return bearerToken(client) !== null;
  } catch {
    return false;
  }
}

/** An ApiError from a raw error body (text), with the API's message where it sent one. */
export const apiErrorFrom = apiErrorFromText;
