import { CUT_ROUNDING_STEPS_IN, defaultShopRules, type ShopRules } from '@linesmith/routing';

/** How a rule is typed and shown: inches (fractions welcome), a percentage, a ratio shown as a percentage, or a multiple of the hose OD. */
export type ShopRuleUnit = 'in' | 'percent' | 'ratio' | 'od';

type TableKey = 'heatClearanceIn' | 'supportSpacingByDashIn';

export type ShopRuleFieldId =
  | 'supportSpacingIn'
  | `supportSpacingDash${string}`
  | 'heatClearanceExhaustIn'
  | 'heatClearanceTurboIn'
  | 'heatClearanceOtherIn'
  | 'sleeveOverlapIn'
  | 'slackMinIn'
  | 'slackMinSameMountIn'
  | 'slackPercent'
  | 'straightAfterSocketOd'
  | 'minFreeHoseIn'
  | 'measuredShortfallPercent'
  | 'measuredExcessPercent'
  | 'restrictionRatio'
  | 'cutRoundingIn'
  | 'trimAllowanceIn';

export interface ShopRuleField {
  id: ShopRuleFieldId;
  /** The shop rule the field edits; its origin is shown beside the field. */
  rule: keyof ShopRules;
  /** Path of the value inside `ShopRules`, as zod reports it in issues. */
  path: readonly [keyof ShopRules] | readonly [TableKey, string];
  label: string;
  help: string;
  unit: ShopRuleUnit;
  /** The only values the routing library accepts, offered as a choice instead of free text. */
  choices?: readonly number[];
  /** This row's own origin, where it is one row of a sourced table. */
  origin?: string;
}

/** Tube OD of a dash size in inches as a fraction (dash = sixteenths): 6 → 3/8. */
function tubeOdText(dash: number): string {
  const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));
  const whole = Math.floor(dash / 16);
  const rest = dash % 16;
  if (rest === 0) return String(whole);
  const g = gcd(rest, 16);
  const fraction = `${rest / g}/${16 / g}`;
  return whole ? `${whole}-${fraction}` : fraction;
}

/** One row per dash size of the seeded spacing table (FAA AC 43.13-1B Table 9-3), smallest first. */
const spacingFields: ShopRuleField[] = Object.keys(defaultShopRules.supportSpacingByDashIn)
  .sort((a, b) => Number(a) - Number(b))
  .map((dash) => ({
    id: `supportSpacingDash${dash}` as const,
    rule: 'supportSpacingByDashIn' as const,
    path: ['supportSpacingByDashIn', dash] as const,
    label: `Support spacing: -${dash}`,
    help: `Longest unsupported span of a -${dash} hose (${tubeOdText(Number(dash))} in tube OD).`,
    unit: 'in' as const,
    origin: `FAA AC 43.13-1B, Table 9-3, ${tubeOdText(Number(dash))} in tube, aluminium-alloy column (value from memory; the shorter column is kept for hose — common practice).`,
  }));

/** Every field of the shop rules form, in display order. */
export const shopRuleFields: readonly ShopRuleField[] = [
  ...spacingFields,
  {
    id: 'supportSpacingIn',
    rule: 'supportSpacingIn',
    path: ['supportSpacingIn'],
    label: 'Support spacing: other sizes',
    help: 'Longest unsupported span for a hose size the table above does not list.',
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
    id: 'slackMinSameMountIn',
    rule: 'slackMinSameMountIn',
    path: ['slackMinSameMountIn'],
    label: 'Minimum slack on one mount',
    help: 'Least slack where both ends ride on the same mount.',
    unit: 'in',
  },
  {
    id: 'slackPercent',
    rule: 'slackPercent',
    path: ['slackPercent'],
    label: 'Slack as a share of length',
    help: 'Slack on every line as a percentage of its length, when more than the minimum for its mount case.',
    unit: 'percent',
  },
  {
    id: 'straightAfterSocketOd',
    rule: 'straightAfterSocketOd',
    path: ['straightAfterSocketOd'],
    label: 'Straight hose past the socket',
    help: 'Straight stretch, in hose outside diameters, between the hose end’s socket and the start of a bend.',
    unit: 'od',
  },
  {
    id: 'minFreeHoseIn',
    rule: 'minFreeHoseIn',
    path: ['minFreeHoseIn'],
    label: 'Minimum free hose',
    help: 'Least hose between the two sockets of a line.',
    unit: 'in',
  },
  {
    id: 'measuredShortfallPercent',
    rule: 'measuredShortfallPercent',
    path: ['measuredShortfallPercent'],
    label: 'Measured length: shortfall allowed',
    help: 'How much shorter than the straight between the ports on the sketch a measured length may be before it is questioned.',
    unit: 'percent',
  },
  {
    id: 'measuredExcessPercent',
    rule: 'measuredExcessPercent',
    path: ['measuredExcessPercent'],
    label: 'Measured length: excess allowed',
    help: 'How much longer than the drawn route a measured length may be before a note asks to check it.',
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
  if (head === 'supportSpacingByDashIn') return rules.supportSpacingByDashIn[key as string] ?? rules.supportSpacingIn;
  return rules[head] as number;
}

export function writeRuleValue(rules: ShopRules, field: ShopRuleField, value: number): ShopRules {
  const [head, key] = field.path;
  if (head === 'heatClearanceIn') {
    return { ...rules, heatClearanceIn: { ...rules.heatClearanceIn, [key as keyof ShopRules['heatClearanceIn']]: value } };
  }
  if (head === 'supportSpacingByDashIn') {
    return { ...rules, supportSpacingByDashIn: { ...rules.supportSpacingByDashIn, [key as string]: value } };
  }
  return { ...rules, [head]: value };
}
