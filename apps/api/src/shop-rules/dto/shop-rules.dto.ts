import { shopRulesSchema, type ShopRules } from '@linesmith/routing';
import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { versionSchema } from '../../common/validation/numbers.js';

/** GET /api/shop-rules: the shop's rules, the defaults beside them and where each default comes from. */
export interface ShopRulesDto {
  rules: ShopRules;
  defaults: ShopRules;
  origins: Readonly<Record<keyof ShopRules, string>>;
  /** 0 while the shop still runs on the defaults (no saved row). */
  version: number;
  updatedAt: string | null;
}

/** PUT /api/shop-rules: the whole set of rules (missing keys take their defaults), against a version. */
export const putShopRulesSchema = z.object({
  version: versionSchema,
  rules: shopRulesSchema,
});
export class PutShopRulesDto extends zodDto(putShopRulesSchema) {}
export type PutShopRules = z.output<typeof putShopRulesSchema>;
