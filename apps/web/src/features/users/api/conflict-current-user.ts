import { z } from 'zod';
import { ApiError } from '../../../lib/api-error';
import { userSchema, type User } from './user-schema';

const conflictBodySchema = z.looseObject({ current: userSchema });

/** The server's current row sent with a 409 on a stale `version`, or null for any other error. */
export function conflictCurrentUser(error: unknown): User | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const parsed = conflictBodySchema.safeParse(error.body);
  return parsed.success ? parsed.data.current : null;
}
