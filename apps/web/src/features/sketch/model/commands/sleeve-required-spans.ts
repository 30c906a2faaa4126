import type { Interval } from '@linesmith/routing';
import { byId, command, newId } from './command';

export interface SleeveRequiredSpansArgs {
  lineId: string;
  /** The evaluation's planned sleeve intervals (the hot stretches plus the shop's overlap), inches. */
  plannedIn: Interval[];
  partId?: string | null;
}

/** Replaces the line's sleeves with one per stretch the evaluation says needs a sleeve. */
export const sleeveRequiredSpans = command<SleeveRequiredSpansArgs>(
  'Sleeve required spans',
  (draft, { lineId, plannedIn, partId = null }) => {
    byId(draft.lines, lineId, 'line').sleeves = plannedIn
      .filter((i) => i.end > i.start)
      .map((i) => ({ id: newId(), startIn: i.start, endIn: i.end, partId }));
  },
);
