import type { ConnectionSpec } from '../connections.js';
import { familyLabel, findRow } from '../standards/tables.js';
import type { ThreadRow } from '../standards/thread-row.js';
import { looksAlike, sameThread, tellApartHint } from './look-alike.js';
import type { MateResult } from './mate-result.js';

function describe(spec: ConnectionSpec, row: ThreadRow): string {
  return `${spec.gender} ${familyLabel(spec.family)} ${row.size} (${row.designation})`;
}

/**
 * Whether two connection ends join (DOMAIN.md §1, Mating). Symmetric: the checks only ever
 * compare the two sides, and every message names the pair in a fixed order.
 * Order of checks: size known → barb → thread → gender → seat.
 */
export function mate(a: ConnectionSpec, b: ConnectionSpec): MateResult {
  // Fixed order so mate(a, b) and mate(b, a) word their messages the same way.
  const [first, second] = orderPair(a, b);
  const rowA = findRow(first.family, first.size);
  const rowB = findRow(second.family, second.size);
  if (!rowA || !rowB) {
    const unknown = [rowA ? undefined : first, rowB ? undefined : second]
      .filter((spec): spec is ConnectionSpec => spec !== undefined)
      .map((spec) => `${familyLabel(spec.family)} size "${spec.size}"`);
    return {
      ok: false,
      code: 'joint-thread',
      message: `Unknown size: ${unknown.join(' and ')} is not in the thread tables, so this joint cannot be checked. Check the size.`,
    };
  }
  if (!rowA.threaded || !rowB.threaded) {
    return {
      ok: false,
      code: 'joint-thread',
      message: `A hose barb only takes a hose pushed over it; it does not join ${
        rowA.threaded ? describe(first, rowA) : rowB.threaded ? describe(second, rowB) : 'another barb'
      }.`,
    };
  }
  if (!sameThread(rowA, rowB)) {
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
      message: `Two ${first.gender} ends (${rowA.designation}) cannot join: one side must be ${
        first.gender === 'male' ? 'female' : 'male'
      }.`,
    };
  }
  if (first.family !== second.family) {
    return {
      ok: false,
      code: 'joint-seat',
      message: `The threads engage (both ${rowA.designation}) but the seats differ: ${familyLabel(first.family)} against ${familyLabel(
        second.family,
      )} — it will leak.`,
      hint: tellApartHint(rowA, rowB),
    };
  }
  if (first.family === 'npt') {
    return {
      ok: true,
      code: 'ok',
      message: `${rowA.designation} pipe threads join. They seal on the thread: use a sealant rated for the fluid, and never put sealant on a flare or O-ring seat.`,
    };
  }
  return { ok: true, code: 'ok', message: `${familyLabel(first.family)} ${rowA.size} (${rowA.designation}): male into female, same seat.` };
}

function orderPair(a: ConnectionSpec, b: ConnectionSpec): [ConnectionSpec, ConnectionSpec] {
  const ka = `${a.family}|${a.size}|${a.gender}`;
  const kb = `${b.family}|${b.size}|${b.gender}`;
  return ka <= kb ? [a, b] : [b, a];
}
