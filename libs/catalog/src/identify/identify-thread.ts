import { z } from 'zod';
import type { Family } from '../connections.js';
import { pitchMmOf, sameThread, telltaleOf } from '../mating/look-alike.js';
import { nptMaleMajorRangeIn } from '../threads/npt-gauge.js';
import { MM_PER_IN } from '../standards/dash.js';
import { families, familyLabel, familyRows } from '../standards/tables.js';
import type { ThreadRow } from '../standards/thread-row.js';

/** A bench reading of a male thread. Give the diameter in inches or millimetres, and TPI or pitch. */
export const threadReadingSchema = z
  .object({
    odIn: z.number().positive().optional(),
    odMm: z.number().positive().optional(),
    tpi: z.number().positive().optional(),
    pitchMm: z.number().positive().optional(),
    tapered: z.boolean().optional(),
  })
  .refine((r) => r.odIn !== undefined || r.odMm !== undefined || r.tpi !== undefined || r.pitchMm !== undefined, {
    message: 'Give at least a diameter or a pitch',
  });
export type ThreadReading = z.input<typeof threadReadingSchema>;

export interface ThreadCandidate {
  family: Family;
  size: string;
  designation: string;
  /** 0..1, higher is closer. */
  score: number;
  hint: string;
}

/**
 * How far below basic major diameter a good-to-worn straight male thread reads: class 2A / 6g
 * allowance plus major-diameter tolerance, with some wear (ASME B1.1 / ISO 965 order of size).
 */
const STRAIGHT_UNDERSIZE_IN = 0.012;
/** Diameter error at which the diameter score falls to 1/e. */
const DIAMETER_SCALE_IN = 0.02;
/** Relative pitch error at which the pitch score falls to 1/e: 18 vs 16.9 TPI is already ~0.06. */
const PITCH_SCALE = 0.025;
/** A stated taper that disagrees with the row leaves a small score (the reading may be wrong). */
const TAPER_MISMATCH = 0.15;
const MIN_SCORE = 0.02;
const MAX_CANDIDATES = 12;

/** Major diameters a caliper may read on a male of this row, in. */
function expectedMajorRangeIn(row: ThreadRow): { minIn: number; maxIn: number } {
  if (row.tapered && row.tpi !== undefined) {
    const range = nptMaleMajorRangeIn(row.majorDiameterIn, row.tpi);
    // A caliper across the pipe itself reads the pipe OD, which sits inside or just above the range.
    return { minIn: range.minIn, maxIn: Math.max(range.maxIn, row.majorDiameterIn) };
  }
  return { minIn: row.majorDiameterIn - STRAIGHT_UNDERSIZE_IN, maxIn: row.majorDiameterIn };
}

function gaussian(error: number, scale: number): number {
  return Math.exp(-((error / scale) ** 2));
}

function checkPositive(name: string, value: number | undefined): void {
  if (value !== undefined && !(value > 0 && Number.isFinite(value))) {
    throw new RangeError(`${name} must be a positive number`);
  }
}

/** Candidate threads for a reading, best first (DOMAIN.md §1, Thread identifier). */
export function identifyThread(reading: ThreadReading): ThreadCandidate[] {
  checkPositive('odIn', reading.odIn);
  checkPositive('odMm', reading.odMm);
  checkPositive('tpi', reading.tpi);
  checkPositive('pitchMm', reading.pitchMm);
  const odIn = reading.odIn ?? (reading.odMm === undefined ? undefined : reading.odMm / MM_PER_IN);
  const pitchMm = reading.pitchMm ?? (reading.tpi === undefined ? undefined : MM_PER_IN / reading.tpi);
  if (odIn === undefined && pitchMm === undefined) return [];

  const scored: Array<{ row: ThreadRow; score: number }> = [];
  for (const family of families) {
    for (const row of familyRows(family)) {
      if (!row.threaded) continue;
      let score = 1;
      if (odIn !== undefined) {
        const { minIn, maxIn } = expectedMajorRangeIn(row);
        const error = odIn < minIn ? minIn - odIn : odIn > maxIn ? odIn - maxIn : 0;
        score *= gaussian(error, DIAMETER_SCALE_IN);
      }
      const rowPitch = pitchMmOf(row);
      if (pitchMm !== undefined && rowPitch !== undefined) {
        score *= gaussian(Math.abs(pitchMm - rowPitch) / rowPitch, PITCH_SCALE);
      }
      if (reading.tapered !== undefined && reading.tapered !== row.tapered) score *= TAPER_MISMATCH;
      if (score >= MIN_SCORE) scored.push({ row, score });
    }
  }
  scored.sort((x, y) => y.score - x.score || x.row.majorDiameterIn - y.row.majorDiameterIn);
  const top = scored.slice(0, MAX_CANDIDATES);
  return top.map(({ row, score }) => ({
    family: row.family,
    size: row.size,
    designation: row.designation,
    score: Math.round(score * 1000) / 1000,
    hint: hintFor(
      row,
      top.map((c) => c.row),
    ),
  }));
}

/** What the candidate is, and how to tell it from the others on the list with the same thread. */
function hintFor(row: ThreadRow, others: readonly ThreadRow[]): string {
  const twins = others.filter((other) => other !== row && sameThread(other, row));
  const own = `${familyLabel(row.family)} ${row.size}: ${telltaleOf(row.family)}.`;
  if (twins.length === 0) return own;
  const names = [...new Set(twins.map((t) => `${familyLabel(t.family)} ${t.size}`))].join(', ');
  return `${own} Same thread as ${names}: tell them apart by the seat, not the thread.`;
}
