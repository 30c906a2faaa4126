import type { ShopRules } from '@linesmith/routing';
import { readRuleValue, shopRuleFields, writeRuleValue, type ShopRuleField } from './shop-rule-fields';

/** The fields the admin changed from the rules they started editing. */
export function changedRuleFields(original: ShopRules, edited: ShopRules): ShopRuleField[] {
  return shopRuleFields.filter((field) => readRuleValue(original, field) !== readRuleValue(edited, field));
}

/**
 * After a conflict: the server's current rules with only the admin's own changes written over
 * them, so what someone else changed in the other fields meanwhile survives.
 */
export function reapplyRuleChanges(original: ShopRules, edited: ShopRules, current: ShopRules): ShopRules {
  return changedRuleFields(original, edited).reduce(
    (rules, field) => writeRuleValue(rules, field, readRuleValue(edited, field)),
    current,
  );
}
