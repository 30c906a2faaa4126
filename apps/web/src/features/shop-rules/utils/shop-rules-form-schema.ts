import { parseInches, shopRulesSchema, type ShopRules } from '@linesmith/routing';
import { z } from 'zod';
import { readRuleValue, shopRuleFields, writeRuleValue, type ShopRuleField, type ShopRuleFieldId } from './shop-rule-fields';
import { ruleValueDisplay, ruleValueText } from './rule-value-text';

export type ShopRulesFormValues = Record<ShopRuleFieldId, string>;

const fieldById = new Map(shopRuleFields.map((field) => [field.id, field]));
const fieldByPath = new Map(shopRuleFields.map((field) => [field.path.join('.'), field]));

/** The number typed in a field, in the unit `ShopRules` stores; null when the text is not one. */
function parseFieldText(field: ShopRuleField, text: string): number | null {
  if (field.unit === 'in') {
    try {
      return parseInches(text);
    } catch {
      return null;
    }
  }
  const body = text.trim().replace(/\s*(?:%|×\s*(?:hose\s*)?OD|x\s*OD)$/i, '').replace(',', '.');
  if (!/^-?(?:\d+(?:\.\d*)?|\.\d+)$/.test(body)) return null;
  const percent = Number(body);
  return field.unit === 'ratio' ? percent / 100 : percent;
}

function notANumberMessage(field: ShopRuleField): string {
  if (field.unit === 'in') return 'Enter a length in inches, for example 1 1/2, 1-1/2 or 1.5.';
  if (field.unit === 'od') return 'Enter a number of hose outside diameters, for example 2.';
  return 'Enter a percentage as a number, for example 4.';
}

/** The limits are the routing library's (`shopRulesSchema`); only the words are the form's. */
function rangeMessage(field: ShopRuleField, issue: z.core.$ZodIssue): string {
  if (issue.code === 'too_small') {
    const bound = ruleValueDisplay(Number(issue.minimum), field.unit);
    return issue.inclusive === false ? `Enter more than ${bound}.` : `Enter ${bound} or more.`;
  }
  if (issue.code === 'too_big') {
    const bound = ruleValueDisplay(Number(issue.maximum), field.unit);
    return issue.inclusive === false ? `Enter less than ${bound}.` : `Enter at most ${bound}.`;
  }
  return issue.message;
}

export const shopRulesFormValuesSchema = z.object(
  Object.fromEntries(shopRuleFields.map((field) => [field.id, z.string()])) as Record<ShopRuleFieldId, z.ZodString>,
);

/**
 * Form text → `ShopRules`. Fields are written over `base` (the record being edited), so any
 * rule the form does not show keeps its stored value.
 */
export function shopRulesFormSchema(base: ShopRules) {
  return shopRulesFormValuesSchema.transform((values, ctx): ShopRules => {
    let rules = base;
    for (const [id, text] of Object.entries(values) as [ShopRuleFieldId, string][]) {
      const field = fieldById.get(id);
      if (!field) continue;
      const value = parseFieldText(field, text);
      if (value === null) ctx.addIssue({ code: 'custom', path: [id], message: notANumberMessage(field) });
      else rules = writeRuleValue(rules, field, value);
    }
    const checked = shopRulesSchema.safeParse(rules);
    if (!checked.success) {
      for (const issue of checked.error.issues) {
        const field = fieldByPath.get(issue.path.join('.'));
        // A field that did not parse already has its message.
        if (field && parseFieldText(field, values[field.id]) !== null) {
          ctx.addIssue({ code: 'custom', path: [field.id], message: rangeMessage(field, issue) });
        }
      }
      return z.NEVER;
    }
    return checked.data;
  });
}

/** The form's texts for a set of rules. */
export function shopRulesFormValues(rules: ShopRules): ShopRulesFormValues {
  return Object.fromEntries(
    shopRuleFields.map((field) => [field.id, ruleValueText(readRuleValue(rules, field), field.unit)]),
  ) as ShopRulesFormValues;
}

/** The form field an API issue points at (`rules.heatClearanceIn.exhaust` → the exhaust field). */
export function fieldOfApiIssue(path: string): ShopRuleFieldId | undefined {
  return fieldByPath.get(path.replace(/^rules\./, ''))?.id;
}
