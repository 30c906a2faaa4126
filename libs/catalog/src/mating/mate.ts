import type { ConnectionSpec, Family } from '../connections.js';
import { seatFormInfo, seatOf } from '../standards/seat-forms.js';
import { connectionProblem, familyLabel, findRow } from '../standards/tables.js';
import type { ThreadRow } from '../standards/thread-row.js';
import { looksAlike, sameThread, tellApartHint } from './look-alike.js';
import type { MateResult } from './mate-result.js';

function seatWords(spec: ConnectionSpec): string {
  const seat = seatOf(spec);
  const info = seat === undefined ? undefined : seatFormInfo(spec.family, seat);
  return info ? `, ${info.label}` : '';
}

function describe(spec: ConnectionSpec, row: ThreadRow): string {
  return `${spec.gender} ${familyLabel(spec.family)} ${row.size} (${row.designation}${seatWords(spec)})`;
}

/**
 * Pairs of families whose threads differ only in taper, where one way round is a recognised
 * joint: the taper male into the parallel female (ISO 7-1 allows R into Rp; an NPSM female
 * swivel goes on a pipe-thread male with a 30° seat). `taper` is the male's family.
 */
const taperIntoParallel: ReadonlyArray<{ taper: Family; parallel: Family; caution: string }> = [
  {
    taper: 'bspt',
    parallel: 'bspp',
    caution:
      'A BSP taper male in a parallel female is a joint ISO 7-1 allows (R into Rp), sealed on the thread with a sealant rated for the fluid. A parallel port made for a washer or O-ring stud (ISO 228-1 / ISO 1179) is not made to seal on its thread: use a parallel stud with its seal there.',
  },
  {
    taper: 'npt',
    parallel: 'npsm',
    caution:
      'An NPSM female swivel seals on a 30° seat, not the thread: this holds only where the pipe-thread male has the 30° inverted seat (chamfer). Do not put sealant on the seat.',
  },
  {
    taper: 'nptf',
    parallel: 'npsm',
    caution:
      'An NPSM female swivel seals on a 30° seat, not the thread: this holds only where the pipe-thread male has the 30° inverted seat (chamfer). Do not put sealant on the seat.',
  },
];

function samePitchAndSize(a: ThreadRow, b: ThreadRow): boolean {
  return a.size === b.size && a.tpi !== undefined && a.tpi === b.tpi && a.flankAngleDeg === b.flankAngleDeg;
}

/** Joins of two ends that are fine, in shop words. */
function okMessage(first: ConnectionSpec, row: ThreadRow): string {
  switch (first.family) {
    case 'npt':
    case 'bspt':
      return `${row.designation} pipe threads join. They seal on the thread: use a sealant rated for the fluid, and never put sealant on a flare or O-ring seat.`;
    case 'nptf':
      return `${row.designation} dryseal threads join and seal by crest-to-root contact; a sealant rated for the fluid is still common practice on fuel.`;
    case 'npsm':
      return `${row.designation}: the joint seals on the 30° seat, not the thread; no sealant on the seat.`;
    case 'banjo':
      return `${row.designation}: bolt through the banjo eye into the port, with a crush washer on each face of the eye (two per joint).`;
    case 'qc':
      return `${row.designation}: push the end form in until the retainer locks, then pull back to check it holds. Replace a damaged retainer.`;
    default:
      return `${familyLabel(first.family)} ${row.size} (${row.designation}${seatWords(first)}): male into female, same seat.`;
  }
}

/**
 * Whether two connection ends join (DOMAIN.md §1, Mating). Symmetric: the checks only ever
 * compare the two sides, and every message names the pair in a fixed order.
 * Order of checks: size and seat form known → unthreaded ends → thread → gender → seat.
 */
export function mate(a: ConnectionSpec, b: ConnectionSpec): MateResult {
  // Fixed order so mate(a, b) and mate(b, a) word their messages the same way.
  const [first, second] = orderPair(a, b);
  const problems = [connectionProblem(first), connectionProblem(second)].filter((p): p is string => p !== undefined);
  const rowA = findRow(first.family, first.size);
  const rowB = findRow(second.family, second.size);
  if (problems.length > 0 || !rowA || !rowB) {
    const unknown = !rowA || !rowB;
    return {
      ok: false,
      code: 'joint-thread',
      message: `${unknown ? 'Unknown size' : 'Unknown seat form'}: ${problems.join(' and ')}, so this joint cannot be checked. Check the ${unknown ? 'size' : 'seat form'}.`,
    };
  }
  if (!rowA.threaded || !rowB.threaded) {
    if (rowA.family === 'qc' && rowB.family === 'qc' && rowA.size === rowB.size) {
      if (first.gender === second.gender) {
        return { ok: false, code: 'joint-gender', message: `Two ${first.gender} quick-connect ends (${rowA.designation}) cannot join: one must be the end form, the other the connector.` };
      }
      return { ok: true, code: 'ok', message: okMessage(first, rowA) };
    }
    const result: MateResult = {
      ok: false,
      code: 'joint-thread',
      message: unthreadedMessage(first, rowA, second, rowB),
    };
    if (looksAlike(rowA, rowB)) result.hint = tellApartHint(rowA, rowB);
    return result;
  }
  if (!sameThread(rowA, rowB)) {
    const pair = taperIntoParallel.find(
      (p) => (p.taper === first.family && p.parallel === second.family) || (p.taper === second.family && p.parallel === first.family),
    );
    if (pair && samePitchAndSize(rowA, rowB)) return taperParallelJoint(first, rowA, second, rowB, pair);
    const result: MateResult = {
      ok: false,
      code: 'joint-thread',
      message: `The threads differ: ${describe(first, rowA)} will not join ${describe(second, rowB)}.`,
    };
    if (looksAlike(rowA, rowB)) result.hint = tellApartHint(rowA, rowB);
    return result;
  }
  if (first.gender === second.gender) {
    return {
      ok: false,
      code: 'joint-gender',
      message: `Two ${first.gender} ends (${rowA.designation}) cannot join: one side must be ${first.gender === 'male' ? 'female' : 'male'}.`,
    };
  }
  if (first.family !== second.family) {
    const pipe = new Set([first.family, second.family]);
    if (pipe.has('npt') && pipe.has('nptf')) {
      return {
        ok: true,
        code: 'ok',
        message: `${rowA.designation.replace(/ NPTF?$/, '')} NPT and NPTF threads join.`,
        caution:
          'NPTF against NPT: the dry seal is not assured, so use a sealant rated for the fluid on the male thread (never on a flare or O-ring seat), and leak-test before the line is used.',
      };
    }
    return {
      ok: false,
      code: 'joint-seat',
      message: `The threads engage (both ${rowA.designation}) but the seats differ: ${describe(first, rowA)} against ${describe(second, rowB)} — it will leak.`,
      hint: tellApartHint(rowA, rowB),
    };
  }
  const seatA = seatOf(first);
  const seatB = seatOf(second);
  if (seatA !== undefined && seatB !== undefined) {
    const infoA = seatFormInfo(first.family, seatA);
    const infoB = seatFormInfo(second.family, seatB);
    if (infoA && infoB && infoA.group !== infoB.group) {
      return {
        ok: false,
        code: 'joint-seat',
        message: `The threads engage (both ${rowA.designation}) but the seats differ: ${infoA.label} against ${infoB.label} — it will leak.`,
        hint: `Check the seat. ${capitalise(infoA.telltale)}; ${infoB.telltale}.`,
      };
    }
  }
  return { ok: true, code: 'ok', message: okMessage(first, rowA) };
}

function unthreadedMessage(first: ConnectionSpec, rowA: ThreadRow, second: ConnectionSpec, rowB: ThreadRow): string {
  const barb = rowA.family === 'barb' || rowB.family === 'barb';
  if (barb) {
    const other = rowA.family !== 'barb' ? describe(first, rowA) : rowB.family !== 'barb' ? describe(second, rowB) : 'another barb';
    return `A hose barb only takes a hose pushed over it; it does not join ${other}.`;
  }
  return `A quick-connect end only joins its own size of quick-connect: ${describe(first, rowA)} will not join ${describe(second, rowB)}.`;
}

function taperParallelJoint(
  first: ConnectionSpec,
  rowA: ThreadRow,
  second: ConnectionSpec,
  rowB: ThreadRow,
  pair: { taper: Family; parallel: Family; caution: string },
): MateResult {
  if (first.gender === second.gender) {
    return { ok: false, code: 'joint-gender', message: `Two ${first.gender} ends (${rowA.designation}, ${rowB.designation}) cannot join: one side must be ${first.gender === 'male' ? 'female' : 'male'}.` };
  }
  const male = first.gender === 'male' ? first : second;
  if (male.family === pair.taper) {
    return {
      ok: true,
      code: 'ok',
      message: `${describe(first, rowA)} joins ${describe(second, rowB)}: a taper male into a parallel female.`,
      caution: pair.caution,
    };
  }
  return {
    ok: false,
    code: 'joint-thread',
    message: `The threads differ in taper: ${describe(first, rowA)} will not seal with ${describe(second, rowB)} — a parallel male does not seal in a taper female.`,
    hint: tellApartHint(rowA, rowB),
  };
}

function orderPair(a: ConnectionSpec, b: ConnectionSpec): [ConnectionSpec, ConnectionSpec] {
  const ka = `${a.family}|${a.size}|${a.gender}|${a.seat ?? ''}`;
  const kb = `${b.family}|${b.size}|${b.gender}|${b.seat ?? ''}`;
  return ka <= kb ? [a, b] : [b, a];
}

function capitalise(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
