/**
 * Thread data written from the standards as quoted in DOMAIN.md §1, independently of the table
 * code, for the tests to check the tables and the mating rules against.
 */
export type Expected = [size: string, designation: string, majorIn: number, tpi: number];

// SAE J514 37° flare (dash → tube OD → thread); DOMAIN.md §1 table.
export const sae514: Array<[dash: number, tubeOdIn: number, designation: string, majorIn: number, tpi: number]> = [
  [2, 1 / 8, '5/16-24 UNF', 0.3125, 24],
  [3, 3 / 16, '3/8-24 UNF', 0.375, 24],
  [4, 1 / 4, '7/16-20 UNF', 0.4375, 20],
  [5, 5 / 16, '1/2-20 UNF', 0.5, 20],
  [6, 3 / 8, '9/16-18 UNF', 0.5625, 18],
  [8, 1 / 2, '3/4-16 UNF', 0.75, 16],
  [10, 5 / 8, '7/8-14 UNF', 0.875, 14],
  [12, 3 / 4, '1-1/16-12 UN', 1.0625, 12],
  [14, 7 / 8, '1-3/16-12 UN', 1.1875, 12],
  [16, 1, '1-5/16-12 UN', 1.3125, 12],
  [20, 1.25, '1-5/8-12 UN', 1.625, 12],
  [24, 1.5, '1-7/8-12 UN', 1.875, 12],
  [32, 2, '2-1/2-12 UN', 2.5, 12],
];

// SAE J512 45° flare; DOMAIN.md §1.
export const sae512flare45: Expected[] = [
  ['1/8', '5/16-24', 0.3125, 24],
  ['3/16', '3/8-24', 0.375, 24],
  ['1/4', '7/16-20', 0.4375, 20],
  ['5/16', '1/2-20', 0.5, 20],
  ['3/8', '5/8-18', 0.625, 18],
  ['1/2', '3/4-16', 0.75, 16],
  ['5/8', '7/8-14', 0.875, 14],
  ['3/4', '1-1/16-14', 1.0625, 14],
];

// SAE J512 inverted 45° flare; DOMAIN.md §1 (3/16 and 1/4 confirmed, the rest from memory).
export const sae512inverted: Expected[] = [
  ['1/8', '5/16-28', 0.3125, 28],
  ['3/16', '3/8-24', 0.375, 24],
  ['1/4', '7/16-24', 0.4375, 24],
  ['5/16', '1/2-20', 0.5, 20],
  ['3/8', '5/8-18', 0.625, 18],
  ['1/2', '3/4-18', 0.75, 18],
  ['5/8', '7/8-18', 0.875, 18],
  ['3/4', '1-1/16-16', 1.0625, 16],
];

// ASME B1.20.1 Table 2: nominal size, pipe OD, TPI.
export const b1201: Expected[] = [
  ['1/16', '1/16-27 NPT', 0.3125, 27],
  ['1/8', '1/8-27 NPT', 0.405, 27],
  ['1/4', '1/4-18 NPT', 0.54, 18],
  ['3/8', '3/8-18 NPT', 0.675, 18],
  ['1/2', '1/2-14 NPT', 0.84, 14],
  ['3/4', '3/4-14 NPT', 1.05, 14],
  ['1', '1-11.5 NPT', 1.315, 11.5],
];

// ISO 6149-1 port sizes (O-ring seat form), ISO 261 fine pitches: diameter mm, pitch mm (from memory).
export const iso6149: Array<[string, number, number]> = [
  ['M8x1', 8, 1],
  ['M10x1', 10, 1],
  ['M12x1.5', 12, 1.5],
  ['M14x1.5', 14, 1.5],
  ['M16x1.5', 16, 1.5],
  ['M18x1.5', 18, 1.5],
  ['M20x1.5', 20, 1.5],
  ['M22x1.5', 22, 1.5],
  ['M27x2', 27, 2],
  ['M30x2', 30, 2],
  ['M33x2', 33, 2],
  ['M42x2', 42, 2],
  ['M48x2', 48, 2],
  ['M60x2', 60, 2],
];

// ISO 6149-1 O-ring (inside diameter x cross-section, mm) per port size (from memory).
export const iso6149Oring: Record<string, string> = {
  M8x1: '6.1x1.6', M10x1: '8.1x1.6', 'M12x1.5': '9.3x2.2', 'M14x1.5': '11.3x2.2', 'M16x1.5': '13.3x2.2', 'M18x1.5': '15.3x2.2',
  'M20x1.5': '17.3x2.2', 'M22x1.5': '19.3x2.2', M27x2: '23.6x2.9', M30x2: '26.6x2.9', M33x2: '29.6x2.9', M42x2: '38.6x2.9',
  M48x2: '44.6x2.9', M60x2: '56.6x2.9',
};

// ISO 9974-1 port sizes (washer type E and sealing-edge type B stud ends), from memory.
export const iso9974: string[] = ['M8x1', 'M10x1', 'M12x1.5', 'M14x1.5', 'M16x1.5', 'M18x1.5', 'M20x1.5', 'M22x1.5', 'M26x1.5', 'M27x2', 'M33x2', 'M42x2', 'M48x2'];
// Washer-sealed automotive sizes outside ISO 9974 (common practice).
export const washerExtra: string[] = ['M10x1.25', 'M12x1.25'];

// ISO 8434-1 24° cone: thread → tube OD mm, L and S series (from memory).
export const iso8434L: Array<[string, number]> = [
  ['M12x1.5', 6], ['M14x1.5', 8], ['M16x1.5', 10], ['M18x1.5', 12], ['M22x1.5', 15], ['M26x1.5', 18], ['M30x2', 22], ['M36x2', 28], ['M45x2', 35], ['M52x2', 42],
];
export const iso8434S: Array<[string, number]> = [
  ['M14x1.5', 6], ['M16x1.5', 8], ['M18x1.5', 10], ['M20x1.5', 12], ['M22x1.5', 14], ['M24x1.5', 16], ['M30x2', 20], ['M36x2', 25], ['M42x2', 30], ['M52x2', 38],
];

// ISO 228-1 Table 1 (BSP parallel, 55°): size, threads per inch, major diameter mm.
export const iso228: Array<[string, number, number]> = [
  ['1/8', 28, 9.728],
  ['1/4', 19, 13.157],
  ['3/8', 19, 16.662],
  ['1/2', 14, 20.955],
  ['5/8', 14, 22.911],
  ['3/4', 14, 26.441],
  ['1', 11, 33.249],
];
// ISO 228-1 Table 1 pitch diameters (mm) to check d2 = d − 0.640327·P against.
export const iso228PitchMm: Record<string, number> = { '1/8': 9.147, '1/4': 12.301, '3/8': 15.806, '1/2': 19.793, '3/4': 25.279, '1': 31.77 };

// ISO 7-1 Table 1 (BSP taper, 55°): the ISO 228-1 sizes except 5/8, same pitch and gauge diameter.
export const iso7: Array<[string, number, number]> = iso228.filter(([size]) => size !== '5/8');

// ASME B1.20.1 NPSM: nominal size, TPI (Table 2 pitches), external major diameter max in (from memory).
export const b1201npsm: Expected[] = [
  ['1/8', '1/8-27 NPSM', 0.397, 27],
  ['1/4', '1/4-18 NPSM', 0.526, 18],
  ['3/8', '3/8-18 NPSM', 0.662, 18],
  ['1/2', '1/2-14 NPSM', 0.823, 14],
  ['3/4', '3/4-14 NPSM', 1.034, 14],
  ['1', '1-11.5 NPSM', 1.293, 11.5],
];

// SAE J1453 O-ring face seal: dash, nut thread, major in, TPI, face O-ring AS568 (from memory).
export const j1453: Array<[dash: number, designation: string, majorIn: number, tpi: number, faceOring: string]> = [
  [4, '9/16-18 UNF', 0.5625, 18, '011'],
  [6, '11/16-16 UN', 0.6875, 16, '012'],
  [8, '13/16-16 UN', 0.8125, 16, '014'],
  [10, '1-14 UNS', 1, 14, '016'],
  [12, '1-3/16-12 UN', 1.1875, 12, '018'],
  [16, '1-7/16-12 UN', 1.4375, 12, '021'],
  [20, '1-11/16-12 UN', 1.6875, 12, '025'],
  [24, '2-12 UN', 2, 12, '029'],
];

// Banjo bolt threads (ISO 261 metric, ASME B1.1 inch; the sizes are common practice): size, major in, pitch mm.
export const banjoBolts: Array<[string, number, number]> = [
  ['M10x1', 10 / 25.4, 1],
  ['M10x1.25', 10 / 25.4, 1.25],
  ['M12x1.25', 12 / 25.4, 1.25],
  ['M12x1.5', 12 / 25.4, 1.5],
  ['M14x1.5', 14 / 25.4, 1.5],
  ['M16x1.5', 16 / 25.4, 1.5],
  ['3/8-24', 0.375, 25.4 / 24],
  ['7/16-20', 0.4375, 25.4 / 20],
  ['1/2-20', 0.5, 25.4 / 20],
];

// SAE J2044 quick-connect sizes by tube OD (from memory): size, tube OD in.
export const j2044: Array<[string, number]> = [
  ['5/16', 5 / 16],
  ['8mm', 8 / 25.4],
  ['3/8', 3 / 8],
  ['10mm', 10 / 25.4],
  ['1/2', 1 / 2],
];

type MatrixFamily = 'flare37' | 'orb' | 'orfs' | 'flare45' | 'invflare45' | 'npt' | 'nptf' | 'npsm' | 'bspp' | 'bspt' | 'metric' | 'banjo' | 'qc';

/** One expected end: family, size (and seat form) and its thread (pitch in mm so inch and metric compare). */
export interface ExpectedThread {
  family: MatrixFamily;
  size: string;
  seat?: 'o-ring' | 'bonded-washer' | 'sealing-edge' | 'cone24-l' | 'cone24-s' | 'cone60';
  /** Ends with the same group fit the same port (ISO 9974-1 takes washer and sealing-edge studs; ISO 1179-1 takes types E, G/H, B). */
  seatGroup?: string;
  majorIn: number;
  pitchMm: number;
  tapered: boolean;
  flankDeg: 55 | 60;
  threaded: boolean;
}

const inch = (family: MatrixFamily, size: string, majorIn: number, tpi: number, tapered: boolean, flankDeg: 55 | 60 = 60): ExpectedThread => ({
  family, size, majorIn, pitchMm: 25.4 / tpi, tapered, flankDeg, threaded: true,
});
const metricEnd = (size: string, seat: ExpectedThread['seat'], seatGroup: string): ExpectedThread => {
  const [d, p] = size.slice(1).split('x').map(Number);
  return { family: 'metric', size, seat, seatGroup, majorIn: d / 25.4, pitchMm: p, tapered: false, flankDeg: 60, threaded: true };
};

export const expectedThreads: ExpectedThread[] = [
  ...sae514.map(([dash, , , majorIn, tpi]) => inch('flare37', `-${dash}`, majorIn, tpi, false)),
  ...sae514.map(([dash, , , majorIn, tpi]) => inch('orb', `-${dash}`, majorIn, tpi, false)),
  ...j1453.map(([dash, , majorIn, tpi]) => inch('orfs', `-${dash}`, majorIn, tpi, false)),
  ...sae512flare45.map(([size, , majorIn, tpi]) => inch('flare45', size, majorIn, tpi, false)),
  ...sae512inverted.map(([size, , majorIn, tpi]) => inch('invflare45', size, majorIn, tpi, false)),
  ...b1201.map(([size, , majorIn, tpi]) => inch('npt', size, majorIn, tpi, true)),
  ...b1201.map(([size, , majorIn, tpi]) => inch('nptf', size, majorIn, tpi, true)),
  ...b1201npsm.map(([size, , majorIn, tpi]) => inch('npsm', size, majorIn, tpi, false)),
  ...iso228.flatMap(([size, tpi, mm]) =>
    (['bonded-washer', 'sealing-edge', 'o-ring', 'cone60'] as const).map((seat) => ({
      ...inch('bspp', size, mm / 25.4, tpi, false, 55),
      seat,
      seatGroup: seat === 'cone60' ? 'cone60' : 'iso1179',
    })),
  ),
  ...iso7.map(([size, tpi, mm]) => inch('bspt', size, mm / 25.4, tpi, true, 55)),
  ...iso6149.map(([size]) => metricEnd(size, 'o-ring', 'iso6149')),
  ...[...iso9974, ...washerExtra].map((size) => metricEnd(size, 'bonded-washer', 'iso9974')),
  ...iso9974.map((size) => metricEnd(size, 'sealing-edge', 'iso9974')),
  ...iso8434L.map(([size]) => metricEnd(size, 'cone24-l', 'cone24-l')),
  ...iso8434S.map(([size]) => metricEnd(size, 'cone24-s', 'cone24-s')),
  ...banjoBolts.map(([size, majorIn, pitchMm]) => ({ family: 'banjo' as const, size, majorIn, pitchMm, tapered: false, flankDeg: 60 as const, threaded: true })),
  ...j2044.map(([size, od]) => ({ family: 'qc' as const, size, majorIn: od, pitchMm: 0, tapered: false, flankDeg: 60 as const, threaded: false })),
];

export function sameExpectedThread(a: ExpectedThread, b: ExpectedThread): boolean {
  return (
    a.threaded &&
    b.threaded &&
    Math.abs(a.majorIn - b.majorIn) < 1e-9 &&
    Math.abs(a.pitchMm - b.pitchMm) < 1e-9 &&
    a.tapered === b.tapered &&
    a.flankDeg === b.flankDeg
  );
}
