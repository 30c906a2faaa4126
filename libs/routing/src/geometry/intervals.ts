/** Closed intervals along a line, in inches from the "from" port (or any 1-D parameter). */
export interface Interval {
  start: number;
  end: number;
}

const byStart = (a: Interval, b: Interval) => a.start - b.start || a.end - b.end;

/** Sorted, non-overlapping union; touching intervals join. */
export function mergeIntervals(intervals: readonly Interval[], joinGap = 0): Interval[] {
  // Plain loops, and no sort when the input is already in order (the usual case along a route).
  const valid: Interval[] = [];
  let inOrder = true;
  for (let k = 0; k < intervals.length; k++) {
    const i = intervals[k];
    if (!(i.end >= i.start)) continue;
    if (inOrder && valid.length > 0 && byStart(valid[valid.length - 1], i) > 0) inOrder = false;
    valid.push(i);
  }
  if (!inOrder) valid.sort(byStart);
  const merged: Interval[] = [];
  for (let k = 0; k < valid.length; k++) {
    const i = valid[k];
    const last = merged.length > 0 ? merged[merged.length - 1] : undefined;
    if (last && i.start <= last.end + joinGap) last.end = Math.max(last.end, i.end);
    else merged.push({ start: i.start, end: i.end });
  }
  return merged;
}

/** Each interval cut to [min, max]; the ones left empty are dropped. */
export function clampIntervals(intervals: readonly Interval[], min: number, max: number): Interval[] {
  const clamped: Interval[] = [];
  for (let k = 0; k < intervals.length; k++) {
    const start = Math.max(min, intervals[k].start);
    const end = Math.min(max, intervals[k].end);
    if (end >= start) clamped.push({ start, end });
  }
  return clamped;
}

/** Each interval widened by `by` at both ends. */
export function growIntervals(intervals: readonly Interval[], by: number): Interval[] {
  const grown: Interval[] = [];
  for (let k = 0; k < intervals.length; k++) grown.push({ start: intervals[k].start - by, end: intervals[k].end + by });
  return grown;
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
  const kept: Interval[] = [];
  for (const i of left) if (i.end - i.start >= minLength) kept.push(i);
  return kept;
}

export function totalLength(intervals: readonly Interval[]): number {
  let sum = 0;
  for (const i of mergeIntervals(intervals)) sum += i.end - i.start;
  return sum;
}
