import { byId, command } from './command';

export const removeCorner = command<{ lineId: string; index: number }>('Remove corner', (draft, { lineId, index }) => {
  const line = byId(draft.lines, lineId, 'line');
  if (!line.points[index]) throw new RangeError(`Line "${lineId}" has no corner ${index}`);
  line.points.splice(index, 1);
});
