import type { ApiClient } from '../../../lib/api-client';
import { ApiError } from '../../../lib/api-error';
import { apiErrorBodySchema } from '../../../lib/contract/api-error-body-schema';
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
export function apiErrorFrom(status: number, bodyText: string, fallback: string): ApiError {
  let raw: unknown;
  try {
    raw = bodyText ? JSON.parse(bodyText) : undefined;
  } catch {
    raw = undefined;
  }
  const parsed = apiErrorBodySchema.safeParse(raw);
  if (parsed.success) {
    const { code, message, issues } = parsed.data;
    return new ApiError({ status, code, message, issues, body: parsed.data });
  }
  if (status === 413) return new ApiError({ status, code: 'payload_too_large', message: 'The file is larger than the server accepts.' });
  return new ApiError({ status, code: 'unexpected_response', message: fallback, body: raw });
}
