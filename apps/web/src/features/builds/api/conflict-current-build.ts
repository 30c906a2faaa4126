import { z } from 'zod';
import { ApiError } from '../../../lib/api-error';
import { buildSchema, type Build } from './build-schema';

const conflictBodySchema = z.looseObject({ current: buildSchema });

/** The server's current build sent with a 409 on a stale `version`, or null for any other error. */
export function conflictCurrentBuild(error: unknown): Build | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const parsed = conflictBodySchema.safeParse(error.body);
  return parsed.success ? parsed.data.current : null;
}
