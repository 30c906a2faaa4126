import { dashLabel, dashToTubeOd } from './dash.js';
import { dashThreads } from './dash-threads.js';
import type { ThreadRow } from './thread-row.js';
import { unifiedRow } from './unified-rows.js';

/**
 * O-ring boss ports, SAE J1926-1 / AS5202: the SAE J514 threads, sealed by an O-ring.
 * The O-ring is AS568 -9NN for dash -NN (from memory until checked against AS568).
 */
export const ORB_SOURCE = 'SAE J1926-1 / AS5202 port threads (the SAE J514 threads); O-ring AS568 -9NN from memory';

export const orbTable: readonly ThreadRow[] = dashThreads.map(({ dash, thread }) =>
  unifiedRow('orb', dashLabel(dash), thread, dashToTubeOd(dash).in, ORB_SOURCE),
);

/** AS568 dash number of the O-ring an O-ring boss size takes: -6 → "906" (from memory). */
export function orbOringAs568(dash: number): string {
  return String(900 + dash);
}
