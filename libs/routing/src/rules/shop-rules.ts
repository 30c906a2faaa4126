import { z } from 'zod';

const inchesAtLeast0 = z.number().finite().nonnegative();
const inchesAbove0 = z.number().finite().positive();

/** The steps a cut length may be rounded up to: 1/16, 1/8, 1/4 or 1/2 in (a tape reads no finer, and coarser wastes hose). */
export const CUT_ROUNDING_STEPS_IN = [0.0625, 0.125, 0.25, 0.5] as const;

/**
 * Longest distance between supports by tube OD, FAA AC 43.13-1B, Table 9-3 ("maximum distance
 * between supports for fluid tubing"), aluminium-alloy tubing column, keyed by dash size (tube OD
 * in sixteenths: -6 = 3/8 in). The aluminium column (values from memory) is the shorter of the
 * table's two columns and is used because hose is heavier and less stiff than tube (common
 * practice). The steel column (1/4 in 16, 5/16 in 18, 3/8 in 20, 1/2 in 23, 5/8 in 25-1/2,
 * 3/4 in 27-1/2, 1 in 30) agrees with MIL-H-8891A, Table II.
 */
export const AC43_13_TABLE_9_3_ALUMINIUM_IN: Readonly<Record<string, number>> = {
  '2': 9.5, // 1/8 in
  '3': 12, // 3/16 in
  '4': 13.5, // 1/4 in
  '5': 15, // 5/16 in
  '6': 16.5, // 3/8 in
  '8': 19, // 1/2 in
  '10': 22, // 5/8 in
  '12': 24, // 3/4 in
  '16': 26.5, // 1 in
};

const dashKey = z.string().regex(/^[1-9]\d?$/, 'A dash size is a whole number from 1 to 99 (6 for -6)');

/** The shop's thresholds used by the rules engine (editable by the admin). */
export const shopRulesSchema = z.object({
  /** Support spacing for a hose whose dash size the table below does not list (or a line without a hose). */
  supportSpacingIn: inchesAbove0.default(18),
  /** Longest unsupported span by hose dash size ("6" for -6). */
  supportSpacingByDashIn: z.record(dashKey, inchesAbove0).default({ ...AC43_13_TABLE_9_3_ALUMINIUM_IN }),
  heatClearanceIn: z
    .object({ exhaust: inchesAtLeast0.default(6), turbo: inchesAtLeast0.default(8), other: inchesAtLeast0.default(4) })
    .default({ exhaust: 6, turbo: 8, other: 4 }),
  sleeveOverlapIn: inchesAtLeast0.default(1),
  /** Least slack on a line whose two ports ride on different mount groups. */
  slackMinIn: inchesAtLeast0.default(1.5),
  /** Least slack on a line whose two ports ride on the same mount group. */
  slackMinSameMountIn: inchesAtLeast0.default(0.5),
  slackPercent: z.number().finite().min(0).max(50).default(4),
  /** Straight hose past the socket before a bend may start, in hose outside diameters. */
  straightAfterSocketOd: z.number().finite().min(0).max(20).default(2),
  /** Least free hose between the two sockets. */
  minFreeHoseIn: inchesAtLeast0.default(2),
  /** How much shorter than the sketch's straight port-to-port distance a measured length may be before it is questioned. */
  measuredShortfallPercent: z.number().finite().min(0).max(90).default(20),
  /** How much longer than the drawn route a measured length may be before a note asks to check it. */
  measuredExcessPercent: z.number().finite().min(0).max(10_000).default(200),
  restrictionRatio: z.number().finite().min(0).max(1).default(0.8),
  cutRoundingIn: z
    .number()
    .refine((v) => (CUT_ROUNDING_STEPS_IN as readonly number[]).includes(v), {
      message: 'Cut lengths round up to 1/16, 1/8, 1/4 or 1/2 in',
    })
    .default(0.125),
  trimAllowanceIn: inchesAtLeast0.default(0.5),
});

export type ShopRules = z.infer<typeof shopRulesSchema>;

export const defaultShopRules: ShopRules = shopRulesSchema.parse({});

/** Where each default comes from, shown beside the value on the admin's shop rules page. */
export const shopRuleOrigins: Readonly<Record<keyof ShopRules, string>> = {
  supportSpacingIn:
    'Common practice: a clamp at least every 18 in for a hose size the spacing table does not list; sources differ, so the shop decides.',
  supportSpacingByDashIn:
    'FAA AC 43.13-1B, Table 9-3 (maximum distance between supports for fluid tubing, by tube OD; dash size = OD in sixteenths), aluminium-alloy column — values from memory; the shorter column is kept for hose (common practice).',
  heatClearanceIn:
    'Common practice: 6 in from exhaust, 8 in from a turbo, 4 in from other hot parts unless shielded or sleeved.',
  sleeveOverlapIn: 'Common practice: a fire sleeve runs 1 in past each end of the hot stretch.',
  slackMinIn:
    'Common practice: at least 1-1/2 in of slack where a line joins parts on different mounts (engine/transmission vs chassis).',
  slackMinSameMountIn:
    'Common practice: at least 1/2 in of slack on every line, even between parts on the same mount, so the hose is never pulled tight.',
  slackPercent:
    'FAA AC 43.13-1B, chapter 9: hose may change length by +2 % / −4 % under pressure, so every line gets at least 4 % slack (common practice).',
  straightAfterSocketOd:
    'Common practice (hose makers’ installation guides): a straight stretch of at least 2 hose outside diameters past the socket before a bend starts, so the hose does not kink at the socket.',
  minFreeHoseIn:
    'Common practice: at least 2 in of free hose between the two sockets; shorter, the hose cannot flex or take up pressure shortening — use a hard adapter or tube.',
  measuredShortfallPercent:
    'Common practice: a photo sketch is off by perspective, but a measured length more than 20 % shorter than the straight distance between the ports on the sketch points at a wrong measurement, scale or port.',
  measuredExcessPercent:
    'Common practice: a real path seldom runs more than three times the drawn route (200 % longer); past that a note asks whether the length was typed in another unit.',
  restrictionRatio: 'Common practice: no bore in the line smaller than 80 % of the hose inside diameter.',
  cutRoundingIn: 'Common practice: cut lengths rounded up to the next 1/8 in — cut long, never short.',
  trimAllowanceIn: 'Common practice: 1/2 in extra hose per cut for squaring the ends.',
};

/** The longest unsupported span for a hose of `dash` (6 for -6): the table's row, else the shop's general spacing. */
export function supportSpacingFor(dash: number | undefined, rules: Pick<ShopRules, 'supportSpacingIn' | 'supportSpacingByDashIn'>): number {
  if (dash === undefined) return rules.supportSpacingIn;
  return rules.supportSpacingByDashIn[String(dash)] ?? rules.supportSpacingIn;
}

/** The old uniform support spacing default, before the spacing table existed. */
const OLD_UNIFORM_SPACING_DEFAULT_IN = 18;

/**
 * Reads shop rules as stored by any version of Linesmith. Rules added later take their defaults.
 * A row saved before the spacing table existed, whose admin had chosen a uniform spacing other than
 * the old 18 in default, keeps that choice for every size (the shop decided it; the table is theirs to edit).
 */
export function migrateShopRules(raw: unknown): ShopRules {
  if (typeof raw === 'object' && raw !== null && !Array.isArray(raw)) {
    const stored = raw as Record<string, unknown>;
    const uniform = stored.supportSpacingIn;
    if (
      stored.supportSpacingByDashIn === undefined &&
      typeof uniform === 'number' &&
      Number.isFinite(uniform) &&
      uniform > 0 &&
      uniform !== OLD_UNIFORM_SPACING_DEFAULT_IN
    ) {
      const table = Object.fromEntries(Object.keys(AC43_13_TABLE_9_3_ALUMINIUM_IN).map((dash) => [dash, uniform]));
      return shopRulesSchema.parse({ ...stored, supportSpacingByDashIn: table });
    }
  }
  return shopRulesSchema.parse(raw);
}
