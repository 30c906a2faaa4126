import { byId, command } from './command';

export interface MoveCornerArgs {
  lineId: string;
  index: number;
  x: number;
  y: number;
}

export const moveCorner = command<MoveCornerArgs>('Move corner', (draft, { lineId, index, x, y }) => {
  const point = byId(draft.lines, lineId, 'line').points[index];
  if (!point) throw new RangeError(`Line "${lineId}" has no corner ${index}`);
  point.x = x;
  point.y = y;
});
