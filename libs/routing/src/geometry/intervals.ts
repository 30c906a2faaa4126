/** Closed intervals along a line, in inches from the "from" port (or any 1-D parameter). */
export interface Interval {
  start: number;
  end: number;
}

const byStart = (a: Interval, b: Interval) => a.start - b.start || a.end - b.end;

/** Sorted, non-overlapping union; touching intervals join. */
export function mergeIntervals(intervals: readonly Interval[], joinGap = 0): Interval[] {
  const sorted = intervals.filter((i) => i.end >= i.start).sort(byStart);
  const merged: Interval[] = [];
  for (const i of sorted) {
    const last = merged[merged.length - 1];
    if (last && i.start <= last.end + joinGap) last.end = Math.max(last.end, i.end);
    else merged.push({ start: i.start, end: i.end });
  }
  return merged;
}

/** Each interval cut to [min, max]; the ones left empty are dropped. */
export function clampIntervals(intervals: readonly Interval[], min: number, max: number): Interval[] {
  return intervals
    .map((i) => ({ start: Math.max(min, i.start), end: Math.min(max, i.end) }))
    .filter((i) => i.end >= i.start);
}

/** Each interval widened by `by` at both ends. */
export function growIntervals(intervals: readonly Interval[], by: number): Interval[] {
  return intervals.map((i) => ({ start: i.start - by, end: i.end + by }));
}

/** What is left of `from` after taking away `remove` (both treated as unions); slivers under `minLength` dropped. */
export function subtractIntervals(from: readonly Interval[], remove: readonly Interval[], minLength = 1e-9): Interval[] {
  const cuts = mergeIntervals(remove);
  const left: Interval[] = [];
  for (const source of mergeIntervals(from)) {
    let cursor = source.start;
    for (const cut of cuts) {
      if (cut.end <= cursor || cut.start >= source.end) continue;
      if (cut.start > cursor) left.push({ start: cursor, end: cut.start });
      cursor = Math.max(cursor, cut.end);
    }
    if (cursor < source.end) left.push({ start: cursor, end: source.end });
  }
  return left.filter((i) => i.end - i.start >= minLength);
}

export const totalLength = (intervals: readonly Interval[]): number =>
  mergeIntervals(intervals).reduce((sum, i) => sum + (i.end - i.start), 0);
