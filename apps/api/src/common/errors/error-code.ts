/** Machine-readable error codes of the API contract; the web app switches on these. */
export const ErrorCode = {
  ValidationFailed: 'validation_failed',
  InvalidCredentials: 'invalid_credentials',
  Unauthorized: 'unauthorized',
  Forbidden: 'forbidden',
  NotFound: 'not_found',
  Conflict: 'conflict',
  InvalidTransition: 'invalid_transition',
  ReviewBlocked: 'review_blocked',
  CircuitTooComplex: 'circuit_too_complex',
  PayloadTooLarge: 'payload_too_large',
  PreconditionRequired: 'precondition_required',
  RateLimited: 'rate_limited',
  BadRequest: 'bad_request',
  Unavailable: 'unavailable',
  Internal: 'internal_error',
} as const;

export type ErrorCode = (typeof ErrorCode)[keyof typeof ErrorCode];

export const HTTP_STATUS_OF: Record<ErrorCode, number> = {
  validation_failed: 400,
  bad_request: 400,
  circuit_too_complex: 400,
  invalid_credentials: 401,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  invalid_transition: 409,
  review_blocked: 409,
  payload_too_large: 413,
  precondition_required: 428,
  rate_limited: 429,
  internal_error: 500,
  unavailable: 503,
};
