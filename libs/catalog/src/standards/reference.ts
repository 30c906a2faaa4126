import type { Family } from '../connections.js';
import { sealForPort } from './seal.js';
import { familyRows, nptGauge, threadOf } from './tables.js';

/** One row of the Reference page's thread table. */
export interface ReferenceRow {
  size: string;
  designation: string;
  majorDiameterIn: number;
  tpi?: number;
  pitchMm?: number;
  tubeOdIn?: number;
  tapered: boolean;
  basicPitchDiameterIn?: number;
  /** NPT only: pitch diameter at the small end and effective thread length, in. */
  e0?: number;
  l2?: number;
  /** The seal the port takes, in words ("O-ring AS568-906"). */
  seal?: string;
  source: string;
}

export function threadTable(family: Family): ReferenceRow[] {
  return familyRows(family).map((row) => {
    const out: ReferenceRow = {
      size: row.size,
      designation: row.designation,
      majorDiameterIn: row.majorDiameterIn,
      tapered: row.tapered,
      source: row.source,
    };
    if (row.tpi !== undefined) out.tpi = row.tpi;
    if (row.pitchMm !== undefined) out.pitchMm = row.pitchMm;
    if (row.tubeOdIn !== undefined) out.tubeOdIn = row.tubeOdIn;
    const basic = threadOf(row)?.basicPitchDiameterIn;
    if (basic !== undefined) out.basicPitchDiameterIn = basic;
    if (family === 'npt') Object.assign(out, nptGauge(row.size));
    const seal = sealForPort({ family, size: row.size, gender: 'female' });
    if (seal?.type === 'o-ring') out.seal = /^\d+$/.test(seal.as568) ? `O-ring AS568-${seal.as568}` : `O-ring ${seal.as568}`;
    return out;
  });
}
