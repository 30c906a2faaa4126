import { MM_PER_IN } from './dash.js';
import type { ThreadRow } from './thread-row.js';

/**
 * Push-to-connect quick-connect ends for fuel and vapour/cooler lines, SAE J2044: a male tube end
 * form (a smooth tube with a raised bead) held in a female connector by its retainer, sealed by
 * O-rings inside the connector. No thread: sizes are the tube OD. Sizes: SAE J2044 (5/16, 3/8,
 * 1/2 in; 8 and 10 mm), from memory until checked.
 */
const J2044 = 'SAE J2044 quick-connect, by tube OD (from memory)';

function qcRow(size: string, tubeOdIn: number, label: string): ThreadRow {
  return {
    family: 'qc',
    size,
    designation: `${label} quick-connect`,
    majorDiameterIn: tubeOdIn,
    tapered: false,
    tubeOdIn,
    threaded: false,
    source: J2044,
  };
}

export const qcTable: readonly ThreadRow[] = [
  qcRow('5/16', 5 / 16, '5/16 in tube'),
  qcRow('8mm', 8 / MM_PER_IN, '8 mm tube'),
  qcRow('3/8', 3 / 8, '3/8 in tube'),
  qcRow('10mm', 10 / MM_PER_IN, '10 mm tube'),
  qcRow('1/2', 1 / 2, '1/2 in tube'),
];

/** "8 mm", "8MM", "8" → "8mm"; '3/8"', "3/8 in" → "3/8". */
export function canonicalQcSize(text: string): string {
  const mm = /^(\d+(?:\.\d+)?)\s*mm$/i.exec(text.trim());
  if (mm) return `${Number(mm[1])}mm`;
  if (/^\d+$/.test(text.trim())) return `${Number(text.trim())}mm`;
  return text.trim();
}
