import { z } from 'zod';
import { ApiError } from '../../../lib/api-error';
import { shopRulesRecordSchema, type ShopRulesRecord } from './shop-rules-record-schema';

const conflictBodySchema = z.looseObject({ current: shopRulesRecordSchema });

/** The server's current rules sent with a 409 on a stale `version`, or null for any other error. */
export function conflictCurrentShopRules(error: unknown): ShopRulesRecord | null {
  if (!(error instanceof ApiError) || error.status !== 409) return null;
  const parsed = conflictBodySchema.safeParse(error.body);
  return parsed.success ? parsed.data.current : null;
}
