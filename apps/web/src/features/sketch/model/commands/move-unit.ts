import { byId, command } from './command';

export interface MoveUnitArgs {
  unitId: string;
  x: number;
  y: number;
}

/** Puts a unit at a new position; its ports (and the ends of its lines) follow. */
export const moveUnit = command<MoveUnitArgs>('Move unit', (draft, { unitId, x, y }) => {
  const unit = byId(draft.units, unitId, 'unit');
  unit.x = x;
  unit.y = y;
});
