/** Node and PostgreSQL error codes that mean "the database cannot be reached right now". */
const UNREACHABLE_NODE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'ENOTFOUND', 'EHOSTUNREACH', 'EPIPE']);
// PostgreSQL class 08 (connection exception) and 57P01-57P03 (admin shutdown, crash, cannot connect now).
const UNREACHABLE_PG_CODES = /^(08\d{3}|57P0[1-3])$/;
const UNREACHABLE_MESSAGES = /Connection terminated|connection timeout|Client has encountered a connection error|Connection refused/i;

export function isDatabaseUnavailable(error: unknown): boolean {
  if (!(error instanceof Error)) return false;
  const code = (error as { code?: unknown }).code;
  if (typeof code === 'string' && (UNREACHABLE_NODE_CODES.has(code) || UNREACHABLE_PG_CODES.test(code))) return true;
  if (UNREACHABLE_MESSAGES.test(error.message)) return true;
  // TypeORM wraps driver errors (QueryFailedError.driverError); AggregateError carries several.
  const nested = [(error as { driverError?: unknown }).driverError, (error as { cause?: unknown }).cause];
  if (error instanceof AggregateError) nested.push(...error.errors);
  return nested.some((inner) => inner !== undefined && inner !== error && isDatabaseUnavailable(inner));
}
