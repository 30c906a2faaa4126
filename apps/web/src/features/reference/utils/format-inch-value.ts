import { formatInches, parseInches } from '@linesmith/routing';

/** Finest fraction a shop or a standard writes a size in. */
const finestDenominator = 64;

/**
 * Inches the way a size is written: a fraction where the value is one (`9/16`, `1-1/2`, `18`),
 * otherwise a decimal to 4 places as the thread standards print it (`0.405`, `0.5512`).
 */
export function formatInchValue(valueIn: number): string {
  const fraction = formatInches(valueIn, finestDenominator);
  if (Math.abs(parseInches(fraction) - valueIn) < 1e-9) return fraction;
  return String(Number(valueIn.toFixed(4)));
}
