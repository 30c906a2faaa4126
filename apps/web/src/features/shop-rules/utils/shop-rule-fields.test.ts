import { defaultShopRules, shopRulesSchema } from '@linesmith/routing';
import { describe, expect, it } from 'vitest';
import { readRuleValue, shopRuleFields } from './shop-rule-fields';

// Checked against the routing library's shop rules schema, the one the API validates PUT bodies with.
describe('shop rule fields', () => {
  it('edits exactly the rules of the shop rules schema, each heat clearance on its own', () => {
    const paths = shopRuleFields.map((field) => field.path.join('.')).sort();
    const expected = Object.entries(defaultShopRules)
      .flatMap(([key, value]) => (typeof value === 'number' ? [key] : Object.keys(value).map((inner) => `${key}.${inner}`)))
      .sort();
    expect(paths).toEqual(expected);
    expect(new Set(shopRuleFields.map((field) => field.rule))).toEqual(new Set(Object.keys(shopRulesSchema.shape)));
  });

  it('reads the defaults back through each field path', () => {
    const values = Object.fromEntries(shopRuleFields.map((field) => [field.id, readRuleValue(defaultShopRules, field)]));
    // Common practice defaults named in the schema: 18 in clamp spacing, 6/8/4 in heat clearance.
    expect(values).toMatchObject({ supportSpacingIn: 18, heatClearanceExhaustIn: 6, heatClearanceTurboIn: 8, heatClearanceOtherIn: 4 });
  });
});
