import { z } from 'zod';
import type { Family } from '../connections.js';
import { looksAlike, pitchMmOf, sameThread, telltaleOf } from '../mating/look-alike.js';
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
    /** The flank angle, once a thread gauge has answered it: 55° (BSP) or 60° (unified, NPT, metric). */
    flankAngleDeg: z.union([z.literal(55), z.literal(60)]).optional(),
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
  /** 60° (unified, NPT, metric) or 55° (BSP). */
  flankAngleDeg: 55 | 60;
  /**
   * A question that separates this candidate from close ones of the other thread form, asked
   * when the reading cannot tell 55° from 60° ("Does a 55° thread gauge fit?").
   */
  question?: string;
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
/** A stated flank angle that disagrees with the row: a gauge answer is firmer than a caliper's. */
const FLANK_MISMATCH = 0.05;
const MIN_SCORE = 0.02;
const MAX_CANDIDATES = 16;
/** Candidates scoring at least this share of the best one count as close enough to ask about. */
const CLOSE_SHARE = 0.2;

export const FLANK_QUESTION =
  'Does a 55° thread gauge fit? If it seats without light under the flanks, it is BSP (55°); if a 60° gauge fits, it is NPT, unified or metric.';

/** Major diameters a caliper may read on a male of this row, in. */
function expectedMajorRangeIn(row: ThreadRow): { minIn: number; maxIn: number } {
  if (row.tapered && row.gaugeLengthIn !== undefined) {
    // BSP taper (ISO 7-1): the gauge diameter is at the gauge plane; the small end is one gauge
    // length smaller along the 1:16 taper, and the thread runs on a little past the gauge plane.
    return { minIn: row.majorDiameterIn - row.gaugeLengthIn / 16, maxIn: row.majorDiameterIn + row.gaugeLengthIn / 64 };
  }
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

  const scoreOf = (row: ThreadRow): number => {
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
    if (reading.flankAngleDeg !== undefined && reading.flankAngleDeg !== row.flankAngleDeg) score *= FLANK_MISMATCH;
    return score;
  };
  const threadedRows = families.flatMap((family) => familyRows(family)).filter((row) => row.threaded);
  const byRank = (x: { row: ThreadRow; score: number }, y: { row: ThreadRow; score: number }) =>
    y.score - x.score || x.row.majorDiameterIn - y.row.majorDiameterIn || families.indexOf(x.row.family) - families.indexOf(y.row.family);
  const scored = threadedRows.map((row) => ({ row, score: scoreOf(row) })).filter((c) => c.score >= MIN_SCORE);
  scored.sort(byRank);
  const top = scored.slice(0, MAX_CANDIDATES);
  const best = top[0]?.score ?? 0;
  const close = top.filter((c) => c.score >= best * CLOSE_SHARE);
  // Look-alikes of the other flank angle (1/4-19 BSP against 1/4-18 NPT) stay on the list even
  // when the pitch reading is against them: a 19 TPI gauge nearly seats in 18 TPI over a short
  // thread, and only a 55° or 60° gauge settles it.
  const rivals: Array<{ row: ThreadRow; score: number }> = [];
  if (reading.flankAngleDeg === undefined) {
    const listed = new Map(top.map((c) => [c.row, c]));
    const closeRows = new Set(close.map((c) => c.row));
    for (const row of threadedRows) {
      if (closeRows.has(row)) continue;
      if (close.some((c) => c.row.flankAngleDeg !== row.flankAngleDeg && looksAlike(c.row, row))) {
        rivals.push(listed.get(row) ?? { row, score: Math.max(scoreOf(row), 0.001) });
      }
    }
    top.push(...rivals.filter((c) => !listed.has(c.row)).sort(byRank));
  }
  const closeOrRival = [...close, ...rivals];
  // 55° against 60° is a question only the thread gauge answers when the caliper and pitch cannot.
  const askFlank = reading.flankAngleDeg === undefined && new Set(closeOrRival.map((c) => c.row.flankAngleDeg)).size > 1;
  const rivalsToName = askFlank ? closeOrRival.map((c) => c.row) : [];
  const rows = top.map((c) => c.row);
  return top.map(({ row, score }) => {
    const candidate: ThreadCandidate = {
      family: row.family,
      size: row.size,
      designation: row.designation,
      score: Math.round(score * 1000) / 1000,
      hint: hintFor(row, rows, rivalsToName),
      flankAngleDeg: row.flankAngleDeg ?? 60,
    };
    if (askFlank && rivalsToName.includes(row)) candidate.question = FLANK_QUESTION;
    return candidate;
  });
}

/**
 * What the candidate is, how to tell it from the others on the list with the same thread, and
 * from close look-alikes of the other flank angle.
 */
function hintFor(row: ThreadRow, others: readonly ThreadRow[], closeRivals: readonly ThreadRow[]): string {
  const twins = others.filter((other) => other !== row && sameThread(other, row));
  let hint = `${familyLabel(row.family)} ${row.size}: ${telltaleOf(row.family)}.`;
  if (twins.length > 0) {
    const names = [...new Set(twins.map((t) => `${familyLabel(t.family)} ${t.size}`))].join(', ');
    const pipe = twins.every((t) => t.tapered) && row.tapered;
    hint += ` Same thread as ${names}: tell them apart by the ${pipe ? 'marking or the maker\'s data' : 'seat, not the thread'}.`;
  }
  const otherForm = closeRivals.filter((r) => r !== row && r.flankAngleDeg !== row.flankAngleDeg);
  if (otherForm.length > 0) {
    // The closest look-alike: the same nominal size first (1/4 BSP against 1/4 NPT), then the nearest diameter.
    const rival = [...otherForm].sort(
      (x, y) => Number(y.size === row.size) - Number(x.size === row.size) || Math.abs(x.majorDiameterIn - row.majorDiameterIn) - Math.abs(y.majorDiameterIn - row.majorDiameterIn),
    )[0];
    const pitch = row.tpi !== undefined && rival.tpi !== undefined && row.tpi !== rival.tpi ? `, ${row.tpi} against ${rival.tpi} threads per inch` : '';
    hint += ` Looks like ${familyLabel(rival.family)} ${rival.designation} (${row.flankAngleDeg ?? 60}° against ${rival.flankAngleDeg ?? 60}° flanks${pitch}): ${FLANK_QUESTION}`;
  }
  return hint;
}
