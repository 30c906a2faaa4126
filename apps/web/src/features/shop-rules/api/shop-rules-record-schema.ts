import { shopRulesSchema } from '@linesmith/routing';
import { z } from 'zod';

/** `GET /api/shop-rules` and the answer of `PUT`: the rules, their defaults and origins, and the row version. */
export const shopRulesRecordSchema = z.object({
  rules: shopRulesSchema,
  defaults: shopRulesSchema,
  origins: z.record(shopRulesSchema.keyof(), z.string()),
  version: z.number().int().nonnegative(),
  // A shop that never saved its rules runs on the defaults and has no change date yet.
  updatedAt: z.iso.datetime({ offset: true }).nullable(),
});

export type ShopRulesRecord = z.infer<typeof shopRulesRecordSchema>;
