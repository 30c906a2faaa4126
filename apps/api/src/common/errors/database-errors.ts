/** Node and PostgreSQL error codes that mean "the database cannot be reached right now". */
const UNREACHABLE_NODE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'ENOTFOUND', 'EHOSTUNREACH', 'EPIPE']);
// PostgreSQL class 08 (connection exception) and 57P01-57P03 (admin shutdown, crash, cannot connect now).
const UNREACHABLE_PG_CODES = /^(08\d{3}|57P0[1-3])$/;
const UNREACHABLE_MESSAGES =
  /Connection terminated|connection timeout|Client has encountered a connection error|Connection refused|Driver not Connected/i;

// TypeORM's own errors when its pool is closed or was never opened.
const NOT_CONNECTED_ERRORS = new Set(['CannotExecuteNotConnectedError', 'ConnectionIsNotSetError']);

interface ErrorLike {
  name?: unknown;
  message?: unknown;
  code?: unknown;
  driverError?: unknown;
  cause?: unknown;
  errors?: unknown;
}

/** Duck-typed (not `instanceof Error`): socket errors may come from another realm. */
export function isDatabaseUnavailable(error: unknown): boolean {
  if (typeof error !== 'object' || error === null) return false;
  const { name, message, code, driverError, cause, errors } = error as ErrorLike;
  if (typeof name === 'string' && NOT_CONNECTED_ERRORS.has(name)) return true;
  if (typeof code === 'string' && (UNREACHABLE_NODE_CODES.has(code) || UNREACHABLE_PG_CODES.test(code))) return true;
  if (typeof message === 'string' && UNREACHABLE_MESSAGES.test(message)) return true;
  // TypeORM wraps driver errors (QueryFailedError.driverError); an AggregateError carries several.
  const nested = [driverError, cause, ...(Array.isArray(errors) ? errors : [])];
  return nested.some((inner) => inner !== undefined && inner !== error && isDatabaseUnavailable(inner));
}
