import { dashLabel, dashToTubeOd } from './dash.js';
import { dashThreads, SAE_J514_SOURCE } from './dash-threads.js';
import type { ThreadRow } from './thread-row.js';
import { unifiedRow } from './unified-rows.js';

/** 37° flare, sizes by dash. Source: SAE J514 (see dash-threads.ts). */
export const flare37Table: readonly ThreadRow[] = dashThreads.map(({ dash, thread }) =>
  unifiedRow('flare37', dashLabel(dash), thread, dashToTubeOd(dash).in, SAE_J514_SOURCE),
);
