import { byId, command } from './command';

export interface RotateUnitArgs {
  unitId: string;
  /** Degrees clockwise; kept in [0, 360). */
  rotation: number;
}

export const rotateUnit = command<RotateUnitArgs>('Rotate unit', (draft, { unitId, rotation }) => {
  byId(draft.units, unitId, 'unit').rotation = ((rotation % 360) + 360) % 360;
});
