import { dashLabel, dashToTubeOd } from './dash.js';
import type { ThreadRow } from './thread-row.js';

/**
 * Push-on hose barbs by dash size (hose inside diameter in sixteenths). No thread: a barb takes
 * a hose pushed over it, never a port. Sizes offered: common practice.
 */
const BARB = 'common practice (push-on hose barb, no thread)';

export const barbTable: readonly ThreadRow[] = [4, 6, 8, 10, 12].map((dash) => ({
  family: 'barb' as const,
  size: dashLabel(dash),
  designation: `${dashLabel(dash)} hose barb`,
  majorDiameterIn: dashToTubeOd(dash).in,
  tapered: false,
  threaded: false,
  source: BARB,
}));
