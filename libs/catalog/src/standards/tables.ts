import type { Family } from '../connections.js';
import { basicPitchDiameterIn } from '../threads/unified-thread.js';
import { nptGaugeFor, type NptGauge } from '../threads/npt-gauge.js';
import { barbTable } from './barb.table.js';
import { parseDash } from './dash.js';
import { flare37Table } from './flare37.table.js';
import { flare45Table } from './flare45.table.js';
import { invflare45Table } from './invflare45.table.js';
import { metricDesignation, metricTable, parseMetricDesignation } from './metric.table.js';
import { nptTable } from './npt.table.js';
import { orbTable } from './orb.table.js';
import type { ThreadRow } from './thread-row.js';

const tables: Readonly<Record<Family, readonly ThreadRow[]>> = {
  flare37: flare37Table,
  flare45: flare45Table,
  invflare45: invflare45Table,
  orb: orbTable,
  npt: nptTable,
  metric: metricTable,
  barb: barbTable,
};

/** Every family, in the order the Reference page lists them. */
export const families: readonly Family[] = ['flare37', 'orb', 'flare45', 'invflare45', 'npt', 'metric', 'barb'];

const labels: Readonly<Record<Family, string>> = {
  flare37: '37° flare',
  flare45: '45° SAE flare',
  invflare45: 'Inverted 45° flare',
  orb: 'O-ring boss',
  npt: 'NPT pipe thread',
  metric: 'Metric',
  barb: 'Hose barb',
};

export function familyLabel(family: Family): string {
  return labels[family];
}

/** Rows of one family, smallest first. */
export function familyRows(family: Family): readonly ThreadRow[] {
  return tables[family];
}

/** Writes a size the way the tables do: "6" → "-6", "m14 x 1.5" → "M14x1.5", '3/8"' → "3/8". */
export function canonicalSize(family: Family, size: string): string {
  const text = size.trim().replace(/\s*(?:"|in)$/i, '');
  switch (family) {
    case 'flare37':
    case 'orb':
    case 'barb': {
      const dash = parseDash(text);
      return dash === undefined ? text : `-${dash}`;
    }
    case 'metric': {
      const metric = parseMetricDesignation(text);
      return metric ? metricDesignation(metric.diameterMm, metric.pitchMm) : text;
    }
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

export function listSizes(family: Family): string[] {
  return tables[family].map((row) => row.size);
}

export function isValidSize(family: Family, size: string): boolean {
  return findRow(family, size) !== undefined;
}

export interface ThreadInfo {
  designation: string;
  majorDiameterIn: number;
  tpi?: number;
  pitchMm?: number;
  basicPitchDiameterIn?: number;
  tapered: boolean;
}

/** The thread of a connection size; undefined for an unknown size. Barbs report their hose size. */
export function threadOf(spec: { family: Family; size: string }): ThreadInfo | undefined {
  const row = findRow(spec.family, spec.size);
  if (!row) return undefined;
  const info: ThreadInfo = { designation: row.designation, majorDiameterIn: row.majorDiameterIn, tapered: row.tapered };
  if (row.tpi !== undefined) info.tpi = row.tpi;
  if (row.pitchMm !== undefined) info.pitchMm = row.pitchMm;
  if (row.threaded && !row.tapered && row.tpi !== undefined) {
    info.basicPitchDiameterIn = basicPitchDiameterIn(row.majorDiameterIn, row.tpi);
  }
  return info;
}

/** NPT gauge values E0 and L2 for a nominal pipe size; undefined for an unknown size. */
export function nptGauge(size: string): NptGauge | undefined {
  const row = findRow('npt', size);
  return row?.tpi === undefined ? undefined : nptGaugeFor(row.majorDiameterIn, row.tpi);
}
