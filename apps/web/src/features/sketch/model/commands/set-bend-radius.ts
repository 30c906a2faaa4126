import { byId, command } from './command';

export interface SetBendRadiusArgs {
  lineId: string;
  index: number;
  /** Inches; 0 is a sharp corner. */
  bendRadiusIn: number;
}

export const setBendRadius = command<SetBendRadiusArgs>('Set bend radius', (draft, { lineId, index, bendRadiusIn }) => {
  if (!(bendRadiusIn >= 0) || !Number.isFinite(bendRadiusIn)) throw new RangeError('A bend radius is 0 or more inches');
  const point = byId(draft.lines, lineId, 'line').points[index];
  if (!point) throw new RangeError(`Line "${lineId}" has no corner ${index}`);
  point.bendRadiusIn = bendRadiusIn;
});
