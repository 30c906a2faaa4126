import { command } from './command';

export interface DeleteUnitArgs {
  unitId: string;
}

/** Removes a unit and every line that ends on one of its ports (a line needs both ports). */
export const deleteUnit = command<DeleteUnitArgs>('Delete unit', (draft, { unitId }) => {
  draft.units = draft.units.filter((u) => u.id !== unitId);
  draft.lines = draft.lines.filter((l) => l.from.unitId !== unitId && l.to.unitId !== unitId);
});
