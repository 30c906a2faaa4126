import type { Interval } from '../geometry/intervals.js';
import type { SlackRule } from './cut-length.js';
import type { Span } from './supports.js';

/** Why a placed sleeve gives no heat cover: no part picked, unknown part, a part that is not a sleeve, a sleeve for another hose OD, or no hose to fit it on. */
export type SleeveProblem = 'no-part' | 'missing' | 'not-a-sleeve' | 'does-not-fit' | 'no-hose';

export interface PlacedSleeve {
  id: string;
  startIn: number;
  endIn: number;
  lengthIn: number;
  partId: string | null;
  /** True when the sleeve counts as heat cover: its part is a sleeve that fits the hose OD. */
  covers: boolean;
  problem?: SleeveProblem;
}

/** Every term of one line's cut length, supports and sleeves, for the cut list and the inspector. */
export interface LineReport {
  lineId: string;
  hosePartId: string | null;
  /** Port → corners → port with sharp corners, in inches; null without calibration. */
  drawnLengthIn: number | null;
  measuredLengthIn: number | null;
  /** The drawn route with its bend radii (port face to port face); null without calibration. */
  centrelineIn: number | null;
  /** Which length the cut is worked from: the measured one wins. */
  basis: 'measured' | 'drawn' | null;
  endStackFromIn: number;
  endStackToIn: number;
  /** True when the two ports ride on different mount groups. */
  crossesMounts: boolean;
  /** Slack in the cut length: the override when set, else `requiredSlackIn`. */
  slackIn: number;
  /** max(shop minimum for the mount case, shop % × length); 0 when no length is known. */
  requiredSlackIn: number;
  /** Which term set `slackIn` (shown on the cut list); null when no length is known. */
  slackRule: SlackRule | null;
  exactCutIn: number | null;
  cutLengthIn: number | null;
  /** ± band of RMA IP-2 Table 4-8 for this cut length. */
  toleranceIn: number | null;
  /** False when two bends' tangents overlap on a leg. */
  fits: boolean;
  supports: {
    atIn: Array<{ id: string; atIn: number }>;
    spans: Span[];
    longestSpanIn: number;
    /** Evenly spaced support positions that would satisfy the shop's spacing. */
    proposedAtIn: number[];
  };
  sleeves: {
    /** Stretches within a heat zone's clearance. */
    requiredIn: Interval[];
    /** The required stretches plus the shop's overlap at each end, clamped to the line. */
    plannedIn: Interval[];
    plannedLengthIn: number;
    placed: PlacedSleeve[];
    /** Required stretches no covering sleeve (see PlacedSleeve.covers) covers. */
    uncoveredIn: Interval[];
    contact: boolean;
    zoneIds: string[];
  };
  /** The catalogue clamp that fits the hose's outside diameter, if any. */
  clampPartId?: string;
}
