/**
 * NPT gauge dimensions, ASME B1.20.1 (Table 2 formulas): taper 1 in 16 on diameter,
 * pitch diameter at the small end E0 = D − (0.05·D + 1.1)/n, effective thread length
 * L2 = (0.8·D + 6.8)/n, thread height h = 0.8/n (D = pipe OD in, n = threads per inch).
 */

export const NPT_TAPER_ON_DIAMETER = 1 / 16;

export interface NptGauge {
  /** Pitch diameter at the small end of the male thread, in. */
  e0: number;
  /** Effective thread length, in. */
  l2: number;
}

export function nptGaugeFor(pipeOdIn: number, tpi: number): NptGauge {
  if (!(pipeOdIn > 0) || !(tpi > 0)) throw new RangeError('Pipe OD and threads per inch must be positive');
  return {
    e0: pipeOdIn - (0.05 * pipeOdIn + 1.1) / tpi,
    l2: (0.8 * pipeOdIn + 6.8) / tpi,
  };
}

export function nptThreadHeightIn(tpi: number): number {
  return 0.8 / tpi;
}

/**
 * Range of major diameters a caliper reads on a male NPT thread, from its small end to the end
 * of the effective thread (pitch diameter + thread height, growing along the taper).
 */
export function nptMaleMajorRangeIn(pipeOdIn: number, tpi: number): { minIn: number; maxIn: number } {
  const { e0, l2 } = nptGaugeFor(pipeOdIn, tpi);
  const h = nptThreadHeightIn(tpi);
  return { minIn: e0 + h, maxIn: e0 + l2 * NPT_TAPER_ON_DIAMETER + h };
}
