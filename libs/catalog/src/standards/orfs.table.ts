import { dashLabel, dashToTubeOd } from './dash.js';
import type { ThreadRow } from './thread-row.js';
import { unifiedRow } from './unified-rows.js';

/**
 * O-ring face seal (ORFS), SAE J1453 / ISO 8434-3: nut thread by dash size, sealed by an O-ring in
 * a groove on the male's flat face. Threads: SAE J1453 thread table. Face O-rings (AS568 dash
 * numbers) are from memory until checked against SAE J1453.
 */
const J1453 = 'SAE J1453 / ISO 8434-3, O-ring face seal nut thread table';

const orfsSizes: ReadonlyArray<{ dash: number; thread: string; faceOringAs568: string }> = [
  { dash: 4, thread: '9/16-18 UNF', faceOringAs568: '011' }, // SAE J1453 thread; O-ring from memory
  { dash: 6, thread: '11/16-16 UN', faceOringAs568: '012' }, // SAE J1453 thread; O-ring from memory
  { dash: 8, thread: '13/16-16 UN', faceOringAs568: '014' }, // SAE J1453 thread; O-ring from memory
  { dash: 10, thread: '1-14 UNS', faceOringAs568: '016' }, // SAE J1453 thread; O-ring from memory
  { dash: 12, thread: '1-3/16-12 UN', faceOringAs568: '018' }, // SAE J1453 thread; O-ring from memory
  { dash: 16, thread: '1-7/16-12 UN', faceOringAs568: '021' }, // SAE J1453 thread; O-ring from memory
  { dash: 20, thread: '1-11/16-12 UN', faceOringAs568: '025' }, // SAE J1453 thread; O-ring from memory
  { dash: 24, thread: '2-12 UN', faceOringAs568: '029' }, // SAE J1453 thread; O-ring from memory
];

export const orfsTable: readonly ThreadRow[] = orfsSizes.map(({ dash, thread }) =>
  unifiedRow('orfs', dashLabel(dash), thread, dashToTubeOd(dash).in, J1453),
);

/** AS568 dash number of an ORFS size's face O-ring ("011" for -4); undefined for an unknown size (from memory). */
export function orfsFaceOringAs568(dash: number): string | undefined {
  return orfsSizes.find((s) => s.dash === dash)?.faceOringAs568;
}
