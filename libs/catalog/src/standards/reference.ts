import type { Family } from '../connections.js';
import type { SealNeed } from '../parts/part.schema.js';
import { sealsForPort } from './seal.js';
import { cone24TubeOd, seatFormsOf, sizeHasSeat } from './seat-forms.js';
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
  /** The seal the port takes, in words ("O-ring AS568-906"); for seat-form families, the default seat's. */
  seal?: string;
  /** 55° (BSP) or 60°; absent for unthreaded ends. */
  flankAngleDeg?: 55 | 60;
  /** Seat-form families: the seat forms this size is made in, each with the seal it takes. */
  seatForms?: Array<{ seat: string; label: string; seal?: string; tubeOdMm?: number }>;
  source: string;
}

/** A seal need in words: "O-ring AS568-906", "Bonded washer M14", "2 × crush washer M14". */
export function sealNeedWords(needs: readonly SealNeed[]): string | undefined {
  if (needs.length === 0) return undefined;
  const one = (need: SealNeed) =>
    need.type === 'o-ring'
      ? /^\d+$/.test(need.as568)
        ? `O-ring AS568-${need.as568}`
        : `O-ring ${need.as568}`
      : `${need.type === 'bonded-washer' ? 'Bonded washer' : 'Crush washer'} ${need.size}`;
  const words = needs.map(one);
  return words.every((w) => w === words[0]) && words.length > 1 ? `${words.length} × ${words[0].toLowerCase()}` : words.join(' + ');
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
    if (family === 'npt' || family === 'nptf') Object.assign(out, nptGauge(row.size));
    if (row.flankAngleDeg !== undefined) out.flankAngleDeg = row.flankAngleDeg;
    const seal = sealNeedWords(sealsForPort({ family, size: row.size, gender: 'female' }));
    if (seal) out.seal = seal;
    const seats = seatFormsOf(family).filter((s) => sizeHasSeat(family, row.size, s.seat));
    if (seats.length > 0) {
      out.seatForms = seats.map((s) => {
        const form: NonNullable<ReferenceRow['seatForms']>[number] = { seat: s.seat, label: s.label };
        const words = sealNeedWords(sealsForPort({ family, size: row.size, gender: 'female', seat: s.seat }));
        if (words) form.seal = words;
        const tubeOdMm = cone24TubeOd(row.size, s.seat);
        if (tubeOdMm !== undefined) form.tubeOdMm = tubeOdMm;
        return form;
      });
    }
    return out;
  });
}
