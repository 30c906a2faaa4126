import type { Selection } from '../selection';
import { selectedIds } from '../selection';
import { command } from './command';

export interface MoveSelectionArgs {
  selection: Selection;
  dx: number;
  dy: number;
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
    const withUnits = ids.units.has(line.from.unitId) && ids.units.has(line.to.unitId);
    if (!ids.lines.has(line.id) && !withUnits) continue;
    for (const p of line.points) {
      p.x += dx;
      p.y += dy;
    }
  }
});
