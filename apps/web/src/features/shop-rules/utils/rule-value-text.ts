import { formatInchValue } from '../../reference/utils/format-inch-value';
import type { ShopRuleUnit } from './shop-rule-fields';

/** Percentages of a ratio (0.8 → 80): four decimals are plenty and hide float noise. */
const ratioToPercent = (ratio: number): number => Number((ratio * 100).toFixed(4));

/** A rule value as typed in its field: inches as a fraction where they are one, percentages as numbers. */
export function ruleValueText(value: number, unit: ShopRuleUnit): string {
  if (unit === 'in') return formatInchValue(value);
  if (unit === 'od') return String(Number(value.toFixed(4)));
  return String(unit === 'ratio' ? ratioToPercent(value) : value);
}

/** The unit written after a rule's value. */
export const ruleUnitSuffix = (unit: ShopRuleUnit): string => (unit === 'in' ? 'in' : unit === 'od' ? '× hose OD' : '%');

/** A rule value for reading, with its unit: `1-1/2 in`, `4 %`, `80 %`, `2 × hose OD`. */
export function ruleValueDisplay(value: number, unit: ShopRuleUnit): string {
  return `${ruleValueText(value, unit)} ${ruleUnitSuffix(unit)}`;
}
