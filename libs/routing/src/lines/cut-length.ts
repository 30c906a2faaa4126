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

/**
 * Slack a line needs when its two ports ride on different mounts: max(shop minimum, shop % × length).
 * The 4 % default is the shortening a hose may show under pressure (FAA AC 43.13-1B, ch. 9).
 */
export function requiredSlack(lengthIn: number, rules: Pick<ShopRules, 'slackMinIn' | 'slackPercent'>): number {
  return Math.max(rules.slackMinIn, (rules.slackPercent / 100) * lengthIn);
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
