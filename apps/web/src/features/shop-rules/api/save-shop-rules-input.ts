import type { ShopRules } from '@linesmith/routing';

/** Body of `PUT /api/shop-rules`; `version` is the row version the change was made against. */
export interface SaveShopRulesInput {
  version: number;
  rules: ShopRules;
}
