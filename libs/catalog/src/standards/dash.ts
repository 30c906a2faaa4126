/** The international inch (1959 agreement; NIST SP 811 Appendix B): exactly 25.4 mm. The one place for it. */
export const MM_PER_IN = 25.4;

/** A dash size is the tube OD in sixteenths of an inch (-6 = 6/16 = 3/8 in): trade convention. */
export function dashToTubeOd(dash: number): { in: number; mm: number } {
  if (!(dash > 0) || !Number.isFinite(dash)) throw new RangeError('A dash size must be a positive number');
  const inches = dash / 16;
  return { in: inches, mm: inches * MM_PER_IN };
}

/** "-6" or "6" → 6; undefined for anything else. */
export function parseDash(size: string): number | undefined {
  const match = /^-?(\d{1,2})$/.exec(size.trim());
  if (!match) return undefined;
  const dash = Number(match[1]);
  return dash > 0 ? dash : undefined;
}

export function dashLabel(dash: number): string {
  return `-${dash}`;
}
