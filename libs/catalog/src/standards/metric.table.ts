import { MM_PER_IN } from './dash.js';
import type { ThreadRow } from './thread-row.js';

/** Metric fine threads (ISO 261) used by ISO 6149 O-ring ports; sizes name their pitch. */
const ISO = 'ISO 261 fine pitch; ISO 6149-1 port sizes';

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

function metricRow(diameterMm: number, pitchMm: number): ThreadRow {
  const designation = metricDesignation(diameterMm, pitchMm);
  return {
    family: 'metric',
    size: designation,
    designation,
    majorDiameterIn: diameterMm / MM_PER_IN,
    pitchMm,
    tapered: false,
    threaded: true,
    source: ISO,
  };
}

export const metricTable: readonly ThreadRow[] = [
  metricRow(10, 1), // ISO 261 / ISO 6149-1
  metricRow(12, 1.5), // ISO 261 / ISO 6149-1
  metricRow(14, 1.5), // ISO 261 / ISO 6149-1
  metricRow(16, 1.5), // ISO 261 / ISO 6149-1
  metricRow(18, 1.5), // ISO 261 / ISO 6149-1
  metricRow(22, 1.5), // ISO 261 / ISO 6149-1
  metricRow(27, 2), // ISO 261 / ISO 6149-1
];

/**
 * O-ring for an ISO 6149-1 port, as inside diameter × cross-section in mm (from memory until
 * checked against ISO 6149-1).
 */
export const iso6149Orings: Readonly<Record<string, string>> = {
  M10x1: '8.1x1.6',
  'M12x1.5': '9.3x2.2',
  'M14x1.5': '11.3x2.2',
  'M16x1.5': '13.3x2.2',
  'M18x1.5': '15.3x2.2',
  'M22x1.5': '19.3x2.2',
  M27x2: '23.6x2.9',
};
