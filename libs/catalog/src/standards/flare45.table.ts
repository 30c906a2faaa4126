import type { ThreadRow } from './thread-row.js';
import { unifiedRow } from './unified-rows.js';

/** 45° SAE flare, sizes by tube OD in inches. */
const J512 = 'SAE J512, 45° flare nut thread table';

export const flare45Table: readonly ThreadRow[] = [
  unifiedRow('flare45', '1/8', '5/16-24 UNF', 1 / 8, J512),
  unifiedRow('flare45', '3/16', '3/8-24 UNF', 3 / 16, J512),
  unifiedRow('flare45', '1/4', '7/16-20 UNF', 1 / 4, J512),
  unifiedRow('flare45', '5/16', '1/2-20 UNF', 5 / 16, J512),
  unifiedRow('flare45', '3/8', '5/8-18 UNF', 3 / 8, J512),
  unifiedRow('flare45', '1/2', '3/4-16 UNF', 1 / 2, J512),
  unifiedRow('flare45', '5/8', '7/8-14 UNF', 5 / 8, J512),
  unifiedRow('flare45', '3/4', '1-1/16-14 UNS', 3 / 4, `${J512} (series letters from memory)`),
];
