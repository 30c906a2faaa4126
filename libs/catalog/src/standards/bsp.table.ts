import { MM_PER_IN } from './dash.js';
import type { ThreadRow } from './thread-row.js';

/**
 * British Standard Pipe threads, 55° Whitworth form.
 * - Parallel (BSPP, "G"), ISO 228-1 Table 1: size, threads per inch, major diameter in mm. Not
 *   pressure-tight on the thread: the joint seals on a washer, O-ring or cone (ISO 1179 ports).
 * - Taper (BSPT, "R" male, "Rc" female), ISO 7-1 Table 1: the same pitches, with the major
 *   diameter at the gauge plane equal to the ISO 228-1 value, taper 1 in 16 on diameter, sealing
 *   on the thread. ISO 7-1 has no 5/8 size. Gauge lengths are from memory until checked.
 */
const ISO_228_1 = 'ISO 228-1, Table 1 (major diameter, threads per inch; 55° form)';
const ISO_7_1 = 'ISO 7-1, Table 1 (gauge diameter as ISO 228-1; taper 1:16; gauge length from memory)';

interface BspSize {
  size: string;
  tpi: number;
  majorMm: number;
  /** ISO 7-1 gauge length (small end to gauge plane), mm; undefined where ISO 7-1 has no such size. */
  gaugeLengthMm?: number;
}

const bspSizes: readonly BspSize[] = [
  { size: '1/8', tpi: 28, majorMm: 9.728, gaugeLengthMm: 4.0 }, // ISO 228-1 Table 1; ISO 7-1 gauge length from memory
  { size: '1/4', tpi: 19, majorMm: 13.157, gaugeLengthMm: 6.0 }, // ISO 228-1 Table 1; ISO 7-1 gauge length from memory
  { size: '3/8', tpi: 19, majorMm: 16.662, gaugeLengthMm: 6.4 }, // ISO 228-1 Table 1; ISO 7-1 gauge length from memory
  { size: '1/2', tpi: 14, majorMm: 20.955, gaugeLengthMm: 8.2 }, // ISO 228-1 Table 1; ISO 7-1 gauge length from memory
  { size: '5/8', tpi: 14, majorMm: 22.911 }, // ISO 228-1 Table 1 (not an ISO 7-1 size)
  { size: '3/4', tpi: 14, majorMm: 26.441, gaugeLengthMm: 9.5 }, // ISO 228-1 Table 1; ISO 7-1 gauge length from memory
  { size: '1', tpi: 11, majorMm: 33.249, gaugeLengthMm: 10.4 }, // ISO 228-1 Table 1; ISO 7-1 gauge length from memory
];

export const bsppTable: readonly ThreadRow[] = bspSizes.map((s) => ({
  family: 'bspp' as const,
  size: s.size,
  designation: `${s.size}-${s.tpi} BSPP (G ${s.size})`,
  majorDiameterIn: s.majorMm / MM_PER_IN,
  tpi: s.tpi,
  tapered: false,
  flankAngleDeg: 55 as const,
  threaded: true,
  source: ISO_228_1,
}));

export const bsptTable: readonly ThreadRow[] = bspSizes.flatMap((s) =>
  s.gaugeLengthMm === undefined
    ? []
    : [
        {
          family: 'bspt' as const,
          size: s.size,
          designation: `${s.size}-${s.tpi} BSPT (R ${s.size})`,
          majorDiameterIn: s.majorMm / MM_PER_IN,
          tpi: s.tpi,
          tapered: true,
          flankAngleDeg: 55 as const,
          gaugeLengthIn: s.gaugeLengthMm / MM_PER_IN,
          threaded: true,
          source: ISO_7_1,
        },
      ],
);
