import type { Family } from '../connections.js';
import { MM_PER_IN } from '../standards/dash.js';
import type { ThreadRow } from '../standards/thread-row.js';

/** Thread pitch in mm, whichever way the row states it. */
export function pitchMmOf(row: ThreadRow): number | undefined {
  if (row.pitchMm !== undefined) return row.pitchMm;
  return row.tpi === undefined ? undefined : MM_PER_IN / row.tpi;
}

/** Two rows have the same thread when diameter, pitch, flank angle and taper agree (series letters aside). */
export function sameThread(a: ThreadRow, b: ThreadRow): boolean {
  const pa = pitchMmOf(a);
  const pb = pitchMmOf(b);
  return (
    a.threaded &&
    b.threaded &&
    a.tapered === b.tapered &&
    a.flankAngleDeg === b.flankAngleDeg &&
    Math.abs(a.majorDiameterIn - b.majorDiameterIn) < 1e-6 &&
    pa !== undefined &&
    pb !== undefined &&
    Math.abs(pa - pb) < 1e-6
  );
}

/** Quick-connect tube sizes closer than this look alike on the bench (5/16 in = 7.94 mm against 8 mm). */
const TUBE_LOOK_ALIKE_IN = 0.01;

/**
 * Different ends that are easy to mistake for each other: near-equal pitch (within 7 %, so
 * 16.9 TPI metric M14x1.5 against 16 or 18 TPI counts, and 19 TPI BSP against 18 TPI NPT) and
 * diameters within 1/16 in; the same tube size in two flare families (37° -6 at 9/16-18 against
 * 45° 3/8 at 5/8-18); or quick-connect tube ODs within 0.01 in.
 */
export function looksAlike(a: ThreadRow, b: ThreadRow): boolean {
  if (!a.threaded || !b.threaded) {
    return a.family === 'qc' && b.family === 'qc' && a.size !== b.size && Math.abs(a.majorDiameterIn - b.majorDiameterIn) <= TUBE_LOOK_ALIKE_IN;
  }
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
  orfs: 'an O-ring face seal male has a flat face with an O-ring in a groove and no cone; its nut seals face to face',
  npt: 'a pipe thread tapers (1 in 16 on diameter): it gets larger toward the hex and seals on the thread',
  nptf: 'a dryseal pipe thread (NPTF) tapers like NPT and seals by crest-to-root contact; it looks the same as NPT, so go by the marking or the maker\'s data',
  npsm: 'an NPSM thread is straight (no taper) at pipe-thread pitch and seals on a 30° seat, usually on a female swivel',
  bspp: 'a BSP parallel thread (ISO 228-1, "G") has 55° flanks and no taper, and seals on a washer, O-ring or cone, not on the thread',
  bspt: 'a BSP taper thread (ISO 7-1, "R") has 55° flanks, tapers 1 in 16 and seals on the thread',
  metric: 'a metric thread has its pitch in millimetres (check with a metric pitch gauge); the port decides the seal: O-ring (ISO 6149), washer or sealing edge (ISO 9974), or a 24° cone (ISO 8434-1)',
  banjo: 'a banjo bolt passes through a ring-shaped banjo eye, is drilled through its side and seals with a crush washer on each face of the eye',
  qc: 'a quick-connect end form is a smooth tube with a raised bead held by the female connector\'s retainer; no thread',
  barb: 'a hose barb has ridges for a push-on hose and no thread',
};

export function telltaleOf(family: Family): string {
  return telltale[family];
}

/** The first thing to check when telling two ends apart. */
function leadCheck(a: ThreadRow, b: ThreadRow): string {
  if (!a.threaded || !b.threaded) return 'Measure the tube OD and read the connector\'s marking. ';
  if (a.flankAngleDeg !== b.flankAngleDeg) {
    return 'Check the flank angle: a 55° thread gauge fits BSP, a 60° one fits NPT, unified and metric threads. ';
  }
  if (a.tapered !== b.tapered) return 'Check for taper. ';
  const metricAgainstInch = (a.pitchMm !== undefined) !== (b.pitchMm !== undefined);
  if (metricAgainstInch) return 'Check the pitch with a thread gauge. ';
  return a.family !== b.family ? 'Check the seat. ' : 'Check with a thread gauge. ';
}

/** A hint telling two ends apart; starts with the check that separates them best. */
export function tellApartHint(a: ThreadRow, b: ThreadRow): string {
  const lead = leadCheck(a, b);
  const sides = a.family === b.family ? [telltale[a.family]] : [telltale[a.family], telltale[b.family]];
  const pitches = a.tpi !== undefined && b.tpi !== undefined && a.tpi !== b.tpi ? ` (${a.tpi} against ${b.tpi} threads per inch)` : '';
  const threads = a.designation === b.designation ? '' : ` ${a.designation} and ${b.designation} look alike${pitches}.`;
  return `${lead}${capitalise(sides.join('; '))}.${threads}`;
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
