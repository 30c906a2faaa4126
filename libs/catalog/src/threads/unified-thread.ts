/**
 * Unified inch screw threads (ASME B1.1): parsing designations such as "9/16-18 UNF" or
 * "1-1/16-12 UN", and the basic pitch diameter E = D − 0.649519/n (ASME B1.1, basic profile:
 * E = D − 0.75·H with H = 0.866025/n).
 */

export type UnifiedSeries = 'UNC' | 'UNF' | 'UNEF' | 'UNS' | 'UN';

export interface UnifiedThread {
  /** Designation as written, normalised ("1-1/16-12 UN"). */
  designation: string;
  /** Basic major diameter in inches. */
  majorDiameterIn: number;
  tpi: number;
  series: UnifiedSeries;
}

const designationPattern = /^(?:(\d+)-)?(\d+\/\d+|\d+)-(\d+)\s*(UNEF|UNC|UNF|UNS|UN)$/i;

/** Parses a fraction of an inch written the shop way: "9/16", "1-1/16", "2", "1 1/16". */
export function parseFractionIn(text: string): number | undefined {
  const match = /^(?:(\d+)[-\s])?(?:(\d+)\/(\d+)|(\d+))$/.exec(text.trim());
  if (!match) return undefined;
  const [, whole, num, den, integer] = match;
  if (integer !== undefined) return whole === undefined ? Number(integer) : undefined;
  const denominator = Number(den);
  if (denominator === 0) return undefined;
  return Number(whole ?? 0) + Number(num) / denominator;
}

/** Parses a unified thread designation; undefined when it is not one. */
export function parseUnifiedDesignation(text: string): UnifiedThread | undefined {
  const match = designationPattern.exec(text.trim());
  if (!match) return undefined;
  const [, whole, fraction, tpiText, seriesText] = match;
  const sizeText = whole === undefined ? fraction : `${whole}-${fraction}`;
  const majorDiameterIn = parseFractionIn(sizeText);
  const tpi = Number(tpiText);
  if (majorDiameterIn === undefined || majorDiameterIn <= 0 || tpi <= 0) return undefined;
  const series = seriesText.toUpperCase() as UnifiedSeries;
  return { designation: `${sizeText}-${tpi} ${series}`, majorDiameterIn, tpi, series };
}

/** Basic pitch diameter in inches, ASME B1.1: E = D − 0.649519/n. */
export function basicPitchDiameterIn(majorDiameterIn: number, tpi: number): number {
  if (!(majorDiameterIn > 0) || !(tpi > 0)) throw new RangeError('Diameter and threads per inch must be positive');
  return majorDiameterIn - 0.649519 / tpi;
}
