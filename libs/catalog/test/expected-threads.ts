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

// ISO 261 fine pitches used by ISO 6149 ports: diameter mm, pitch mm.
export const iso6149: Array<[string, number, number]> = [
  ['M10x1', 10, 1],
  ['M12x1.5', 12, 1.5],
  ['M14x1.5', 14, 1.5],
  ['M16x1.5', 16, 1.5],
  ['M18x1.5', 18, 1.5],
  ['M22x1.5', 22, 1.5],
  ['M27x2', 27, 2],
];


/** One expected end: family, size and its thread (pitch in mm so inch and metric compare). */
export interface ExpectedThread {
  family: 'flare37' | 'orb' | 'flare45' | 'invflare45' | 'npt' | 'metric';
  size: string;
  majorIn: number;
  pitchMm: number;
  tapered: boolean;
}

export const expectedThreads: ExpectedThread[] = [
  ...sae514.map(([dash, , , majorIn, tpi]) => ({ family: 'flare37' as const, size: `-${dash}`, majorIn, pitchMm: 25.4 / tpi, tapered: false })),
  ...sae514.map(([dash, , , majorIn, tpi]) => ({ family: 'orb' as const, size: `-${dash}`, majorIn, pitchMm: 25.4 / tpi, tapered: false })),
  ...sae512flare45.map(([size, , majorIn, tpi]) => ({ family: 'flare45' as const, size, majorIn, pitchMm: 25.4 / tpi, tapered: false })),
  ...sae512inverted.map(([size, , majorIn, tpi]) => ({ family: 'invflare45' as const, size, majorIn, pitchMm: 25.4 / tpi, tapered: false })),
  ...b1201.map(([size, , majorIn, tpi]) => ({ family: 'npt' as const, size, majorIn, pitchMm: 25.4 / tpi, tapered: true })),
  ...iso6149.map(([size, diameterMm, pitchMm]) => ({ family: 'metric' as const, size, majorIn: diameterMm / 25.4, pitchMm, tapered: false })),
];

export function sameExpectedThread(a: ExpectedThread, b: ExpectedThread): boolean {
  return Math.abs(a.majorIn - b.majorIn) < 1e-9 && Math.abs(a.pitchMm - b.pitchMm) < 1e-9 && a.tapered === b.tapered;
}
