import type { ConnectionSpec, Family } from '../connections.js';
import { basicPitchDiameterIn, parseUnifiedDesignation } from '../threads/unified-thread.js';
import { banjoTable } from './banjo.table.js';
import { bsppTable, bsptTable } from './bsp.table.js';
import { nptGaugeFor, type NptGauge } from '../threads/npt-gauge.js';
import { barbTable } from './barb.table.js';
import { parseDash } from './dash.js';
import { flare37Table } from './flare37.table.js';
import { flare45Table } from './flare45.table.js';
import { invflare45Table } from './invflare45.table.js';
import { metricDesignation, metricTable, parseMetricDesignation } from './metric.table.js';
import { npsmTable } from './npsm.table.js';
import { nptTable } from './npt.table.js';
import { nptfTable } from './nptf.table.js';
import { orbTable } from './orb.table.js';
import { orfsTable } from './orfs.table.js';
import { canonicalQcSize, qcTable } from './qc.table.js';
import { hasSeatForms, seatFormInfo, seatOf, sizeHasSeat } from './seat-forms.js';
import type { ThreadRow } from './thread-row.js';

const tables: Readonly<Record<Family, readonly ThreadRow[]>> = {
  flare37: flare37Table,
  flare45: flare45Table,
  invflare45: invflare45Table,
  orb: orbTable,
  npt: nptTable,
  nptf: nptfTable,
  npsm: npsmTable,
  bspp: bsppTable,
  bspt: bsptTable,
  orfs: orfsTable,
  metric: metricTable,
  banjo: banjoTable,
  qc: qcTable,
  barb: barbTable,
};

/** Every family, in the order the Reference page and the pickers list them. */
export const families: readonly Family[] = [
  'flare37',
  'orb',
  'orfs',
  'flare45',
  'invflare45',
  'npt',
  'nptf',
  'npsm',
  'bspp',
  'bspt',
  'metric',
  'banjo',
  'qc',
  'barb',
];

const labels: Readonly<Record<Family, string>> = {
  flare37: '37° flare',
  flare45: '45° SAE flare',
  invflare45: 'Inverted 45° flare',
  orb: 'O-ring boss',
  npt: 'NPT pipe thread',
  nptf: 'NPTF dryseal pipe thread',
  npsm: 'NPSM straight pipe (30° seat)',
  bspp: 'BSP parallel (ISO 228-1)',
  bspt: 'BSP taper (ISO 7-1)',
  orfs: 'O-ring face seal',
  metric: 'Metric',
  banjo: 'Banjo bolt',
  qc: 'Quick-connect (SAE J2044)',
  barb: 'Hose barb',
};

export function familyLabel(family: Family): string {
  return labels[family];
}

/** Rows of one family, smallest first. */
export function familyRows(family: Family): readonly ThreadRow[] {
  return tables[family];
}

/**
 * Writes a size the way the tables do: "6" → "-6", "m14 x 1.5" → "M14x1.5", '3/8"' → "3/8",
 * "3/8-24 UNF" → "3/8-24" (banjo), "8 mm" → "8mm" (quick-connect).
 */
export function canonicalSize(family: Family, size: string): string {
  const text = size.trim().replace(/\s*(?:"|in)$/i, '');
  switch (family) {
    case 'flare37':
    case 'orb':
    case 'orfs':
    case 'barb': {
      const dash = parseDash(text);
      return dash === undefined ? text : `-${dash}`;
    }
    case 'metric': {
      const metric = parseMetricDesignation(text);
      return metric ? metricDesignation(metric.diameterMm, metric.pitchMm) : text;
    }
    case 'banjo': {
      const metric = parseMetricDesignation(text);
      if (metric) return metricDesignation(metric.diameterMm, metric.pitchMm);
      const unified = parseUnifiedDesignation(/[a-z]$/i.test(text) ? text : `${text} UN`);
      return unified ? unified.designation.replace(/\s+\S+$/, '') : text;
    }
    case 'qc':
      return canonicalQcSize(text);
    default:
      return text;
  }
}

const rowIndex = new Map<string, ThreadRow>(
  families.flatMap((family) => tables[family].map((row) => [`${family}|${row.size}`, row] as const)),
);

export function findRow(family: Family, size: string): ThreadRow | undefined {
  // Sizes usually arrive written as the tables write them: skip the parsing then.
  return rowIndex.get(`${family}|${size}`) ?? rowIndex.get(`${family}|${canonicalSize(family, size)}`);
}

/** Sizes of a family, smallest first; with a seat form, only the sizes made in that seat form. */
export function listSizes(family: Family, seat?: ConnectionSpec['seat']): string[] {
  const sizes = tables[family].map((row) => row.size);
  return seat === undefined || !hasSeatForms(family) ? sizes : sizes.filter((size) => sizeHasSeat(family, size, seat));
}

/** Whether the size is in the family's thread table (any seat form). */
export function isValidSize(family: Family, size: string): boolean {
  return findRow(family, size) !== undefined;
}

/**
 * Why a connection cannot be checked, in shop words, or undefined when its size is in the tables
 * and, for seat-form families, made in its seat form (the family's default seat when left out).
 */
export function connectionProblem(spec: Pick<ConnectionSpec, 'family' | 'size' | 'seat'>): string | undefined {
  const row = findRow(spec.family, spec.size);
  if (!row) return `${labels[spec.family]} size "${spec.size}" is not in the thread tables`;
  const seat = seatOf(spec);
  if (seat === undefined) return undefined;
  const info = seatFormInfo(spec.family, seat);
  if (!info) return `${labels[spec.family]} has no "${seat}" seat form`;
  if (!sizeHasSeat(spec.family, row.size, seat)) return `${labels[spec.family]} ${row.size} is not made as ${info.label}`;
  return undefined;
}

/** A connection whose size (and seat form, where the family has them) is in the tables. */
export function isValidConnection(spec: Pick<ConnectionSpec, 'family' | 'size' | 'seat'>): boolean {
  return connectionProblem(spec) === undefined;
}

export interface ThreadInfo {
  designation: string;
  majorDiameterIn: number;
  tpi?: number;
  pitchMm?: number;
  basicPitchDiameterIn?: number;
  tapered: boolean;
  /** 60° (unified, NPT, metric) or 55° (BSP); undefined for unthreaded ends. */
  flankAngleDeg?: 55 | 60;
}

/**
 * Basic pitch diameter of the 55° Whitworth form, ISO 228-1: d2 = d − 0.640327·P (P = 1/n in
 * the unit of d).
 */
export function whitworthPitchDiameterIn(majorDiameterIn: number, tpi: number): number {
  return majorDiameterIn - 0.640327 / tpi;
}

/**
 * The thread of a connection size; undefined for an unknown size. Barbs report their hose size
 * and quick-connect ends their tube OD. Basic pitch diameters are given for straight unified
 * threads (ASME B1.1) and BSP parallel (ISO 228-1); not for pipe tapers or NPSM.
 */
export function threadOf(spec: { family: Family; size: string }): ThreadInfo | undefined {
  const row = findRow(spec.family, spec.size);
  if (!row) return undefined;
  const info: ThreadInfo = { designation: row.designation, majorDiameterIn: row.majorDiameterIn, tapered: row.tapered };
  if (row.tpi !== undefined) info.tpi = row.tpi;
  if (row.pitchMm !== undefined) info.pitchMm = row.pitchMm;
  if (row.flankAngleDeg !== undefined) info.flankAngleDeg = row.flankAngleDeg;
  if (row.threaded && !row.tapered && row.tpi !== undefined && row.family !== 'npsm') {
    info.basicPitchDiameterIn =
      row.flankAngleDeg === 55 ? whitworthPitchDiameterIn(row.majorDiameterIn, row.tpi) : basicPitchDiameterIn(row.majorDiameterIn, row.tpi);
  }
  return info;
}

/** NPT gauge values E0 and L2 for a nominal pipe size; undefined for an unknown size. */
export function nptGauge(size: string): NptGauge | undefined {
  const row = findRow('npt', size) ?? findRow('nptf', size);
  return row?.tpi === undefined ? undefined : nptGaugeFor(row.majorDiameterIn, row.tpi);
}
