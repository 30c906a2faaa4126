import { z } from 'zod';
import { ApiError } from '../../../lib/api-error';

/** The server's current row sent with a 409 on a stale `version`, or null for any other error. */
export function conflictCurrent<T>(error: unknown, schema: z.ZodType<T>): T | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const parsed = z.looseObject({ current: schema }).safeParse(error.body);
  return parsed.success ? (parsed.data.current as T) : null;
}
