import { CUT_ROUNDING_STEPS_IN, type ShopRules } from '@linesmith/routing';

/** How a rule is typed and shown: inches (fractions welcome), a percentage, or a ratio shown as a percentage. */
export type ShopRuleUnit = 'in' | 'percent' | 'ratio';

export type ShopRuleFieldId =
  | 'supportSpacingIn'
  | 'heatClearanceExhaustIn'
  | 'heatClearanceTurboIn'
  | 'heatClearanceOtherIn'
  | 'sleeveOverlapIn'
  | 'slackMinIn'
  | 'slackPercent'
  | 'restrictionRatio'
  | 'cutRoundingIn'
  | 'trimAllowanceIn';

export interface ShopRuleField {
  id: ShopRuleFieldId;
  /** The shop rule the field edits; its origin is shown beside the field. */
  rule: keyof ShopRules;
  /** Path of the value inside `ShopRules`, as zod reports it in issues. */
  path: readonly [keyof ShopRules] | readonly ['heatClearanceIn', keyof ShopRules['heatClearanceIn']];
  label: string;
  help: string;
  unit: ShopRuleUnit;
  /** The only values the routing library accepts, offered as a choice instead of free text. */
  choices?: readonly number[];
}

/** Every field of the shop rules form, in display order. */
export const shopRuleFields: readonly ShopRuleField[] = [
  {
    id: 'supportSpacingIn',
    rule: 'supportSpacingIn',
    path: ['supportSpacingIn'],
    label: 'Support spacing',
    help: 'Longest unsupported span before a clamp is needed.',
    unit: 'in',
  },
  {
    id: 'heatClearanceExhaustIn',
    rule: 'heatClearanceIn',
    path: ['heatClearanceIn', 'exhaust'],
    label: 'Heat clearance: exhaust',
    help: 'Closer than this to an exhaust, a line needs a fire sleeve.',
    unit: 'in',
  },
  {
    id: 'heatClearanceTurboIn',
    rule: 'heatClearanceIn',
    path: ['heatClearanceIn', 'turbo'],
    label: 'Heat clearance: turbo',
    help: 'Closer than this to a turbo, a line needs a fire sleeve.',
    unit: 'in',
  },
  {
    id: 'heatClearanceOtherIn',
    rule: 'heatClearanceIn',
    path: ['heatClearanceIn', 'other'],
    label: 'Heat clearance: other hot parts',
    help: 'Closer than this to another hot part, a line needs a fire sleeve.',
    unit: 'in',
  },
  {
    id: 'sleeveOverlapIn',
    rule: 'sleeveOverlapIn',
    path: ['sleeveOverlapIn'],
    label: 'Fire sleeve overlap',
    help: 'Extra sleeve past each end of the hot stretch.',
    unit: 'in',
  },
  {
    id: 'slackMinIn',
    rule: 'slackMinIn',
    path: ['slackMinIn'],
    label: 'Minimum slack across mounts',
    help: 'Least slack where a line joins parts on different mounts.',
    unit: 'in',
  },
  {
    id: 'slackPercent',
    rule: 'slackPercent',
    path: ['slackPercent'],
    label: 'Slack as a share of length',
    help: 'Slack across mounts as a percentage of the line length, when more than the minimum.',
    unit: 'percent',
  },
  {
    id: 'restrictionRatio',
    rule: 'restrictionRatio',
    path: ['restrictionRatio'],
    label: 'Smallest bore',
    help: 'A bore in the line below this share of the hose inside diameter is flagged.',
    unit: 'ratio',
  },
  {
    id: 'cutRoundingIn',
    rule: 'cutRoundingIn',
    path: ['cutRoundingIn'],
    label: 'Round cut lengths up to',
    help: 'Cut lengths are rounded up to a multiple of this.',
    unit: 'in',
    choices: CUT_ROUNDING_STEPS_IN,
  },
  {
    id: 'trimAllowanceIn',
    rule: 'trimAllowanceIn',
    path: ['trimAllowanceIn'],
    label: 'Trim allowance per cut',
    help: 'Extra hose ordered per cut for squaring the ends.',
    unit: 'in',
  },
];

export function readRuleValue(rules: ShopRules, field: ShopRuleField): number {
  const [head, key] = field.path;
  if (head === 'heatClearanceIn') return rules.heatClearanceIn[key as keyof ShopRules['heatClearanceIn']];
  return rules[head] as number;
}

export function writeRuleValue(rules: ShopRules, field: ShopRuleField, value: number): ShopRules {
  const [head, key] = field.path;
  if (head === 'heatClearanceIn') {
    return { ...rules, heatClearanceIn: { ...rules.heatClearanceIn, [key as keyof ShopRules['heatClearanceIn']]: value } };
  }
  return { ...rules, [head]: value };
}
