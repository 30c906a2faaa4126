import { z } from 'zod';

const inchesAtLeast0 = z.number().finite().nonnegative();

/** The steps a cut length may be rounded up to: 1/16, 1/8, 1/4 or 1/2 in (a tape reads no finer, and coarser wastes hose). */
export const CUT_ROUNDING_STEPS_IN = [0.0625, 0.125, 0.25, 0.5] as const;

/** The shop's thresholds used by the rules engine (editable by the admin). */
export const shopRulesSchema = z.object({
  supportSpacingIn: z.number().finite().positive().default(18),
  heatClearanceIn: z
    .object({ exhaust: inchesAtLeast0.default(6), turbo: inchesAtLeast0.default(8), other: inchesAtLeast0.default(4) })
    .default({ exhaust: 6, turbo: 8, other: 4 }),
  sleeveOverlapIn: inchesAtLeast0.default(1),
  slackMinIn: inchesAtLeast0.default(1.5),
  slackPercent: z.number().finite().min(0).max(50).default(4),
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
  supportSpacingIn: 'Common practice: a clamp at least every 18 in; sources differ, so the shop decides.',
  heatClearanceIn:
    'Common practice: 6 in from exhaust, 8 in from a turbo, 4 in from other hot parts unless shielded or sleeved.',
  sleeveOverlapIn: 'Common practice: a fire sleeve runs 1 in past each end of the hot stretch.',
  slackMinIn:
    'Common practice: at least 1-1/2 in of slack where a line joins parts on different mounts (engine/transmission vs chassis).',
  slackPercent:
    'FAA AC 43.13-1B, chapter 9: hose may change length by +2 % / −4 % under pressure, so allow 4 % slack (common practice).',
  restrictionRatio: 'Common practice: no bore in the line smaller than 80 % of the hose inside diameter.',
  cutRoundingIn: 'Common practice: cut lengths rounded up to the next 1/8 in — cut long, never short.',
  trimAllowanceIn: 'Common practice: 1/2 in extra hose per cut for squaring the ends.',
};
