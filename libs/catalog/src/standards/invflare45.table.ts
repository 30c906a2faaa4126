import type { ThreadRow } from './thread-row.js';
import { unifiedRow } from './unified-rows.js';

/**
 * Inverted 45° flare (brake and transmission-cooler lines), sizes by tube OD in inches.
 * SAE J512: only the 3/16 and 1/4 rows are confirmed against published thread charts.
 */
const CONFIRMED = 'SAE J512, inverted flare thread table (confirmed by published thread charts)';
const RECALLED = 'SAE J512, inverted flare — from memory';

export const invflare45Table: readonly ThreadRow[] = [
  unifiedRow('invflare45', '1/8', '5/16-28 UN', 1 / 8, RECALLED),
  unifiedRow('invflare45', '3/16', '3/8-24 UNF', 3 / 16, CONFIRMED),
  unifiedRow('invflare45', '1/4', '7/16-24 UNS', 1 / 4, CONFIRMED),
  unifiedRow('invflare45', '5/16', '1/2-20 UNF', 5 / 16, RECALLED),
  unifiedRow('invflare45', '3/8', '5/8-18 UNF', 3 / 8, RECALLED),
  unifiedRow('invflare45', '1/2', '3/4-18 UNS', 1 / 2, RECALLED),
  unifiedRow('invflare45', '5/8', '7/8-18 UNS', 5 / 8, RECALLED),
  unifiedRow('invflare45', '3/4', '1-1/16-16 UN', 3 / 4, RECALLED),
];
