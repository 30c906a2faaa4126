import type { CircuitLine } from '@linesmith/routing';
import type { Selection } from '../selection';
import { selectedIds } from '../selection';
import { command } from './command';

export interface MoveSelectionArgs {
  selection: Selection;
  dx: number;
  dy: number;
}

/** True when a move of the selection carries the line's corners along (the drag preview asks the same). */
export function cornersMove(line: Pick<CircuitLine, 'id' | 'from' | 'to'>, ids: ReturnType<typeof selectedIds>): boolean {
  return ids.lines.has(line.id) || (ids.units.has(line.from.unitId) && ids.units.has(line.to.unitId));
}

/**
 * Moves the selected units, heat zones and lines by (dx, dy). A line's corners move with it when the
 * line is selected, or when both its units move (so a moved group keeps its shape).
 */
export const moveSelection = command<MoveSelectionArgs>('Move', (draft, { selection, dx, dy }) => {
  const ids = selectedIds(selection);
  for (const unit of draft.units) {
    if (!ids.units.has(unit.id)) continue;
    unit.x += dx;
    unit.y += dy;
  }
  for (const zone of draft.heatZones) {
    if (!ids.zones.has(zone.id)) continue;
    for (const p of zone.polygon) {
      p.x += dx;
      p.y += dy;
    }
  }
  for (const line of draft.lines) {
    if (!cornersMove(line, ids)) continue;
    for (const p of line.points) {
      p.x += dx;
      p.y += dy;
    }
  }
});
