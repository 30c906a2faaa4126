import { z } from 'zod';
import { ApiError } from '../../../lib/api-error';
import { shopProfileSchema, type ShopProfile } from './shop-profile-schema';

const conflictBodySchema = z.looseObject({ current: shopProfileSchema });

/** The server's current profile sent with a 409 on a stale `version`, or null for any other error. */
export function conflictCurrentShopProfile(error: unknown): ShopProfile | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const parsed = conflictBodySchema.safeParse(error.body);
  return parsed.success ? parsed.data.current : null;
}
