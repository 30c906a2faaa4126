/**
 * Comparisons of a computed value with a threshold. Products of decimal inputs carry float noise
 * (0.8 × 0.375 = 0.30000000000000004), so a value at the threshold up to a relative 1e-9 counts as
 * meeting it: no flag for a part exactly at the shop's limit.
 */
export const THRESHOLD_TOLERANCE = 1e-9;

const slop = (limit: number) => THRESHOLD_TOLERANCE * Math.max(1, Math.abs(limit));

/** True when `value` is under `limit` by more than float noise. */
export const isBelow = (value: number, limit: number): boolean => value < limit - slop(limit);

/** True when `value` is over `limit` by more than float noise. */
export const isAbove = (value: number, limit: number): boolean => value > limit + slop(limit);
