import type { ThreadRow } from './thread-row.js';

/**
 * NPSM, straight pipe threads for free-fitting mechanical joints, ASME B1.20.1 (NPSM table):
 * the NPT pitches without taper; the joint seals on a 30° seat (a swivel female's cone against a
 * male's 30° chamfer), not on the thread. Major diameter is the male's largest (external, max).
 * The pitches follow ASME B1.20.1 Table 2; the major diameters are from memory until checked.
 */
const NPSM = 'ASME B1.20.1 NPSM straight pipe thread (pitch as Table 2; external major diameter max from memory)';

function npsmRow(size: string, majorMaxIn: number, tpi: number): ThreadRow {
  return {
    family: 'npsm',
    size,
    designation: `${size}-${tpi} NPSM`,
    majorDiameterIn: majorMaxIn,
    tpi,
    tapered: false,
    flankAngleDeg: 60, // ASME B1.20.1: 60° thread form
    threaded: true,
    source: NPSM,
  };
}

export const npsmTable: readonly ThreadRow[] = [
  npsmRow('1/8', 0.397, 27), // ASME B1.20.1 NPSM, from memory
  npsmRow('1/4', 0.526, 18), // ASME B1.20.1 NPSM, from memory
  npsmRow('3/8', 0.662, 18), // ASME B1.20.1 NPSM, from memory
  npsmRow('1/2', 0.823, 14), // ASME B1.20.1 NPSM, from memory
  npsmRow('3/4', 1.034, 14), // ASME B1.20.1 NPSM, from memory
  npsmRow('1', 1.293, 11.5), // ASME B1.20.1 NPSM, from memory
];
