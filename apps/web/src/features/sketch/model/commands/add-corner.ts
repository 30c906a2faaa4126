import { byId, command } from './command';
import { DEFAULT_BEND_RADIUS_IN } from './add-line';

export interface AddCornerArgs {
  lineId: string;
  /** Position in the corner list the new corner takes (0 = right after the from-port). */
  index: number;
  x: number;
  y: number;
  bendRadiusIn?: number;
}

/** Inserts a corner into a line's route (double-click on a segment). */
export const addCorner = command<AddCornerArgs>('Add corner', (draft, { lineId, index, x, y, bendRadiusIn }) => {
  const line = byId(draft.lines, lineId, 'line');
  const at = Math.max(0, Math.min(index, line.points.length));
  line.points.splice(at, 0, { x, y, bendRadiusIn: bendRadiusIn ?? DEFAULT_BEND_RADIUS_IN });
});
