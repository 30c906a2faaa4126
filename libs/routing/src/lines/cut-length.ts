import type { ShopRules } from '../rules/shop-rules.js';

/**
 * Cut-length tolerance by length band, RMA hose handbook IP-2, Table 4-8:
 * ≤12 in ±1/8, 12–24 ±3/16, 24–36 ±1/4, 36–48 ±3/8, 48–72 ±1/2, over 72 ±1 %.
 */
const TOLERANCE_BANDS: ReadonlyArray<{ upToIn: number; plusMinusIn: number }> = [
  { upToIn: 12, plusMinusIn: 1 / 8 },
  { upToIn: 24, plusMinusIn: 3 / 16 },
  { upToIn: 36, plusMinusIn: 1 / 4 },
  { upToIn: 48, plusMinusIn: 3 / 8 },
  { upToIn: 72, plusMinusIn: 1 / 2 },
];
const OVER_72_FRACTION = 0.01;

/** ± tolerance of a hose cut length (RMA IP-2 Table 4-8). */
export function cutLengthTolerance(lengthIn: number): number {
  const band = TOLERANCE_BANDS.find((b) => lengthIn <= b.upToIn);
  return band ? band.plusMinusIn : lengthIn * OVER_72_FRACTION;
}

/** Rounds up to the next multiple of `stepIn` (cut long, never short); float noise is not a step. */
export function roundCutUp(exactIn: number, stepIn: number): number {
  const steps = exactIn / stepIn;
  const nearest = Math.round(steps);
  return (Math.abs(steps - nearest) < 1e-9 ? nearest : Math.ceil(steps)) * stepIn;
}

/** Which term set a line's slack: the fabricator's override, the shop's percentage of the length, or the shop's minimum for its mount case. */
export type SlackRule = 'override' | 'percent' | 'same-mount-minimum' | 'cross-mount-minimum';

export interface SlackNeed {
  /** max(shop minimum for the mount case, shop % × length). */
  requiredIn: number;
  /** The term that gave `requiredIn`: the percentage, or the minimum for the mount case (the minimum on a tie). */
  rule: Exclude<SlackRule, 'override'>;
}

/**
 * Slack every line needs: max(shop minimum for its mount case, shop % × length). Hose may shorten
 * by up to 4 % under pressure (FAA AC 43.13-1B, ch. 9) on every line; where the two ports ride on
 * different mount groups the shop's larger cross-mount minimum applies (common practice).
 */
export function requiredSlack(
  lengthIn: number,
  rules: Pick<ShopRules, 'slackMinIn' | 'slackMinSameMountIn' | 'slackPercent'>,
  crossesMounts: boolean,
): SlackNeed {
  const minimum = crossesMounts ? rules.slackMinIn : rules.slackMinSameMountIn;
  const share = (rules.slackPercent / 100) * Math.max(0, lengthIn);
  return share > minimum
    ? { requiredIn: share, rule: 'percent' }
    : { requiredIn: minimum, rule: crossesMounts ? 'cross-mount-minimum' : 'same-mount-minimum' };
}

export interface CutLengthInput {
  /** Port face to port face along the centreline (or as measured). */
  overallIn: number;
  endStackFromIn: number;
  endStackToIn: number;
  slackIn: number;
  roundingIn: number;
}

/**
 * Hose cut length = overall length − the two fitting cut-off allowances (hose makers' assembly
 * practice; the end stacks here also carry adapter bodies) + slack, rounded up to the shop's step.
 */
export function cutLength(input: CutLengthInput): { exactCutIn: number; cutLengthIn: number } {
  const exactCutIn = input.overallIn - input.endStackFromIn - input.endStackToIn + input.slackIn;
  return { exactCutIn, cutLengthIn: roundCutUp(exactCutIn, input.roundingIn) };
}

/** How the cut list names the term that set a line's slack. */
export const SLACK_RULE_WORDS: Readonly<Record<SlackRule, string>> = {
  percent: 'shop % of the length',
  'same-mount-minimum': 'shop minimum, one mount',
  'cross-mount-minimum': 'shop minimum, across mounts',
  override: 'set by hand on the line',
};
