import { byId, command } from './command';

/** The length measured along the real path (string or tape); it overrides the drawn length. null clears it. */
export const setMeasuredLength = command<{ lineId: string; measuredLengthIn: number | null }>(
  'Set measured length',
  (draft, { lineId, measuredLengthIn }) => {
    if (measuredLengthIn !== null && !(measuredLengthIn > 0 && Number.isFinite(measuredLengthIn))) {
      throw new RangeError('A measured length is more than 0 in');
    }
    byId(draft.lines, lineId, 'line').measuredLengthIn = measuredLengthIn;
  },
);
