import type { Family } from '../connections.js';
import { parseUnifiedDesignation } from '../threads/unified-thread.js';
import type { ThreadRow } from './thread-row.js';

/** Builds a row from a unified designation; throws at load time if a table holds a typo. */
export function unifiedRow(
  family: Family,
  size: string,
  designation: string,
  tubeOdIn: number | undefined,
  source: string,
): ThreadRow {
  const thread = parseUnifiedDesignation(designation);
  if (!thread) throw new Error(`Not a unified thread designation: ${designation}`);
  return {
    family,
    size,
    designation: thread.designation,
    majorDiameterIn: thread.majorDiameterIn,
    tpi: thread.tpi,
    tapered: false,
    flankAngleDeg: 60, // ASME B1.1 basic profile: 60° included angle
    tubeOdIn,
    threaded: true,
    source,
  };
}
