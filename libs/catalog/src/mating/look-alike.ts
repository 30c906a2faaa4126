import type { Family } from '../connections.js';
import { MM_PER_IN } from '../standards/dash.js';
import type { ThreadRow } from '../standards/thread-row.js';

/** Thread pitch in mm, whichever way the row states it. */
export function pitchMmOf(row: ThreadRow): number | undefined {
  if (row.pitchMm !== undefined) return row.pitchMm;
  return row.tpi === undefined ? undefined : MM_PER_IN / row.tpi;
}

/** Two rows have the same thread when diameter, pitch and taper agree (series letters aside). */
export function sameThread(a: ThreadRow, b: ThreadRow): boolean {
  const pa = pitchMmOf(a);
  const pb = pitchMmOf(b);
  return (
    a.threaded &&
    b.threaded &&
    a.tapered === b.tapered &&
    Math.abs(a.majorDiameterIn - b.majorDiameterIn) < 1e-6 &&
    pa !== undefined &&
    pb !== undefined &&
    Math.abs(pa - pb) < 1e-6
  );
}

/**
 * Different threads that are easy to mistake for each other: near-equal pitch (within 7 %, so
 * 16.9 TPI metric M14x1.5 against 16 or 18 TPI counts) and diameters within 1/16 in, or the
 * same tube size in two flare families (37° -6 at 9/16-18 against 45° 3/8 at 5/8-18).
 */
export function looksAlike(a: ThreadRow, b: ThreadRow): boolean {
  if (!a.threaded || !b.threaded) return false;
  if (a.tubeOdIn !== undefined && a.tubeOdIn === b.tubeOdIn && a.family !== b.family) return true;
  const pa = pitchMmOf(a);
  const pb = pitchMmOf(b);
  if (pa === undefined || pb === undefined) return false;
  const pitchClose = Math.abs(pa - pb) / Math.max(pa, pb) <= 0.07;
  return pitchClose && Math.abs(a.majorDiameterIn - b.majorDiameterIn) <= 0.0625 + 1e-9;
}

/** What sets a family apart on the bench, in shop words. */
const telltale: Readonly<Record<Family, string>> = {
  flare37: 'a 37° flare has a 37° cone seat (check it with a seat-angle gauge)',
  flare45: 'a 45° SAE flare has a 45° cone seat',
  invflare45: 'an inverted flare seats at the bottom of the female port and takes a tube nut',
  orb: 'an O-ring boss male carries an O-ring under the thread and its port has a flat spot face with an O-ring chamfer, no cone',
  npt: 'a pipe thread tapers (1 in 16 on diameter): it gets larger toward the hex and seals on the thread',
  metric: 'a metric thread has its pitch in millimetres (check with a metric pitch gauge); ISO 6149 ports seal with an O-ring',
  barb: 'a hose barb has ridges for a push-on hose and no thread',
};

export function telltaleOf(family: Family): string {
  return telltale[family];
}

/** A hint telling two ends apart; starts with the taper check when a pipe thread is involved. */
export function tellApartHint(a: ThreadRow, b: ThreadRow): string {
  const metricAgainstInch = (a.family === 'metric') !== (b.family === 'metric');
  const lead =
    a.tapered !== b.tapered
      ? 'Check for taper. '
      : metricAgainstInch
        ? 'Check the pitch with a thread gauge. '
        : a.family !== b.family
          ? 'Check the seat. '
          : 'Check with a thread gauge. ';
  const sides = a.family === b.family ? [telltale[a.family]] : [telltale[a.family], telltale[b.family]];
  const threads = a.designation === b.designation ? '' : ` ${a.designation} and ${b.designation} look alike.`;
  return `${lead}${capitalise(sides.join('; '))}.${threads}`;
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
