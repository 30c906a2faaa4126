import { apiErrorBodySchema } from './contract/api-error-body-schema';

export interface ApiIssue {
  path: string;
  message: string;
}

/**
 * Any failed API call. `status` 0 means the server was not reached; `body` keeps the whole
 * error response so a caller can read extra fields such as the `current` row of a 409.
 */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly issues: ApiIssue[];
  readonly body: unknown;

  constructor(init: { status: number; code: string; message: string; issues?: ApiIssue[]; body?: unknown }) {
    super(init.message);
    this.name = 'ApiError';
    this.status = init.status;
    this.code = init.code;
    this.issues = init.issues ?? [];
    this.body = init.body;
  }
}

/**
 * An ApiError from an error response's text: the API's own code and message where it sent its
 * error shape, otherwise `fallback` (a proxy's 413 page, an HTML error page…).
 */
export function apiErrorFromText(status: number, bodyText: string, fallback: string): ApiError {
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
