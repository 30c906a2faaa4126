import type { SeatForm } from '../connections.js';
import { MM_PER_IN } from './dash.js';
import type { ThreadRow } from './thread-row.js';

/**
 * Metric fine threads (ISO 261, 60° form) used by metric ports and tube connectors. A size names
 * its pitch ("M14x1.5"). Which sizes each seat form is made in is in `metricSeatSizes` below.
 */
const ISO_261 = 'ISO 261 fine pitch (60° form)';

/** Parses "M14x1.5" (also "m14 x 1.5", "M14X1,5") into diameter and pitch in mm. */
export function parseMetricDesignation(text: string): { diameterMm: number; pitchMm: number } | undefined {
  const match = /^M\s*(\d+(?:[.,]\d+)?)\s*[x×]\s*(\d+(?:[.,]\d+)?)$/i.exec(text.trim());
  if (!match) return undefined;
  const diameterMm = Number(match[1].replace(',', '.'));
  const pitchMm = Number(match[2].replace(',', '.'));
  return diameterMm > 0 && pitchMm > 0 ? { diameterMm, pitchMm } : undefined;
}

export function metricDesignation(diameterMm: number, pitchMm: number): string {
  return `M${diameterMm}x${pitchMm}`;
}

export function metricRow(family: 'metric' | 'banjo', diameterMm: number, pitchMm: number, source: string): ThreadRow {
  const designation = metricDesignation(diameterMm, pitchMm);
  return {
    family,
    size: designation,
    designation,
    majorDiameterIn: diameterMm / MM_PER_IN,
    pitchMm,
    tapered: false,
    flankAngleDeg: 60, // ISO 68-1 basic profile, used by ISO 261
    threaded: true,
    source,
  };
}

/** [diameter mm, pitch mm] of every metric size offered, smallest first (each an ISO 261 fine-pitch size). */
const metricThreads: ReadonlyArray<[number, number]> = [
  [8, 1],
  [10, 1],
  [10, 1.25],
  [12, 1.25],
  [12, 1.5],
  [14, 1.5],
  [16, 1.5],
  [18, 1.5],
  [20, 1.5],
  [22, 1.5],
  [24, 1.5],
  [26, 1.5],
  [27, 2],
  [30, 2],
  [33, 2],
  [36, 2],
  [42, 2],
  [45, 2],
  [48, 2],
  [52, 2],
  [60, 2],
];

export const metricTable: readonly ThreadRow[] = metricThreads.map(([d, p]) => metricRow('metric', d, p, ISO_261));

/** ISO 6149-1 port sizes (O-ring stud ends, ISO 6149-2/-3), from memory until checked against ISO 6149-1 Table 1. */
const ISO_6149_SIZES = ['M8x1', 'M10x1', 'M12x1.5', 'M14x1.5', 'M16x1.5', 'M18x1.5', 'M20x1.5', 'M22x1.5', 'M27x2', 'M30x2', 'M33x2', 'M42x2', 'M48x2', 'M60x2'];
/** ISO 9974-1 port sizes (stud ends ISO 9974-2 type E and ISO 9974-3 type B; DIN 3852), from memory until checked. */
const ISO_9974_SIZES = ['M8x1', 'M10x1', 'M12x1.5', 'M14x1.5', 'M16x1.5', 'M18x1.5', 'M20x1.5', 'M22x1.5', 'M26x1.5', 'M27x2', 'M33x2', 'M42x2', 'M48x2'];
/** Washer-sealed automotive ports and sender threads outside ISO 9974 (common practice). */
const WASHER_EXTRA_SIZES = ['M10x1.25', 'M12x1.25'];

/**
 * ISO 8434-1 24° cone connectors: thread of the body/nut → tube OD in mm, per series (L light,
 * S heavy). From memory until checked against ISO 8434-1.
 */
export const cone24TubeOdMm: Readonly<Record<'cone24-l' | 'cone24-s', Readonly<Record<string, number>>>> = {
  'cone24-l': { 'M12x1.5': 6, 'M14x1.5': 8, 'M16x1.5': 10, 'M18x1.5': 12, 'M22x1.5': 15, 'M26x1.5': 18, 'M30x2': 22, 'M36x2': 28, 'M45x2': 35, 'M52x2': 42 },
  'cone24-s': { 'M14x1.5': 6, 'M16x1.5': 8, 'M18x1.5': 10, 'M20x1.5': 12, 'M22x1.5': 14, 'M24x1.5': 16, 'M30x2': 20, 'M36x2': 25, 'M42x2': 30, 'M52x2': 38 },
};

/** The sizes each metric seat form is made in. */
export const metricSeatSizes: Readonly<Partial<Record<SeatForm, readonly string[]>>> = {
  'o-ring': ISO_6149_SIZES,
  'bonded-washer': [...ISO_9974_SIZES, ...WASHER_EXTRA_SIZES],
  'sealing-edge': ISO_9974_SIZES,
  'cone24-l': Object.keys(cone24TubeOdMm['cone24-l']),
  'cone24-s': Object.keys(cone24TubeOdMm['cone24-s']),
};

/**
 * O-ring for an ISO 6149-1 port, as inside diameter × cross-section in mm (from memory until
 * checked against ISO 6149-1).
 */
export const iso6149Orings: Readonly<Record<string, string>> = {
  M8x1: '6.1x1.6',
  M10x1: '8.1x1.6',
  'M12x1.5': '9.3x2.2',
  'M14x1.5': '11.3x2.2',
  'M16x1.5': '13.3x2.2',
  'M18x1.5': '15.3x2.2',
  'M20x1.5': '17.3x2.2',
  'M22x1.5': '19.3x2.2',
  M27x2: '23.6x2.9',
  M30x2: '26.6x2.9',
  M33x2: '29.6x2.9',
  M42x2: '38.6x2.9',
  M48x2: '44.6x2.9',
  M60x2: '56.6x2.9',
};
