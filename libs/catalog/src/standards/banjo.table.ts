import { metricRow } from './metric.table.js';
import type { ThreadRow } from './thread-row.js';
import { unifiedRow } from './unified-rows.js';

/**
 * Banjo bolts: the bolt passes through a ring-shaped banjo eye into the port and is drilled so
 * fluid passes from its bore through a cross hole; each face of the eye seals with a crush washer
 * (two per joint). Threads per ISO 261 (metric) and ASME B1.1 (inch); the sizes offered are the
 * ones common on pumps, filters and turbocharger oil feeds (common practice).
 */
const METRIC = 'ISO 261 fine pitch thread; banjo bolt sizes common practice';
const INCH = 'ASME B1.1 unified thread; banjo bolt sizes common practice';

export const banjoTable: readonly ThreadRow[] = [
  metricRow('banjo', 10, 1, METRIC),
  metricRow('banjo', 10, 1.25, METRIC),
  metricRow('banjo', 12, 1.25, METRIC),
  metricRow('banjo', 12, 1.5, METRIC),
  metricRow('banjo', 14, 1.5, METRIC),
  metricRow('banjo', 16, 1.5, METRIC),
  unifiedRow('banjo', '3/8-24', '3/8-24 UNF', undefined, INCH),
  unifiedRow('banjo', '7/16-20', '7/16-20 UNF', undefined, INCH),
  unifiedRow('banjo', '1/2-20', '1/2-20 UNF', undefined, INCH),
].map((row) => ({ ...row, designation: `${row.designation} banjo bolt` }));
