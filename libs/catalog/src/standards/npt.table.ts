import type { ThreadRow } from './thread-row.js';

/** NPT pipe threads, ASME B1.20.1 Table 2: nominal size, pipe OD (in), threads per inch. */
const B1_20_1 = 'ASME B1.20.1, Table 2 (pipe OD, TPI); E0 and L2 by the Table 2 formulas';

function nptRow(size: string, pipeOdIn: number, tpi: number): ThreadRow {
  return {
    family: 'npt',
    size,
    designation: `${size}-${tpi} NPT`,
    flankAngleDeg: 60, // ASME B1.20.1: 60° thread form
    majorDiameterIn: pipeOdIn,
    tpi,
    tapered: true,
    threaded: true,
    source: B1_20_1,
  };
}

export const nptTable: readonly ThreadRow[] = [
  nptRow('1/16', 0.3125, 27), // ASME B1.20.1 Table 2
  nptRow('1/8', 0.405, 27), // ASME B1.20.1 Table 2
  nptRow('1/4', 0.54, 18), // ASME B1.20.1 Table 2
  nptRow('3/8', 0.675, 18), // ASME B1.20.1 Table 2
  nptRow('1/2', 0.84, 14), // ASME B1.20.1 Table 2
  nptRow('3/4', 1.05, 14), // ASME B1.20.1 Table 2
  nptRow('1', 1.315, 11.5), // ASME B1.20.1 Table 2
];
