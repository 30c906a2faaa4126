import type { CircuitUnit } from '@linesmith/routing';
import { byId, command } from './command';

export interface UpdateUnitArgs {
  unitId: string;
  changes: Partial<Pick<CircuitUnit, 'label' | 'kind' | 'mountGroup' | 'valveKind'>>;
}

/** Edits a unit's own fields from the inspector (label, kind, mount group, valve kind). */
export const updateUnit = command<UpdateUnitArgs>('Edit unit', (draft, { unitId, changes }) => {
  const unit = byId(draft.units, unitId, 'unit');
  if (changes.label !== undefined) unit.label = changes.label;
  if (changes.kind !== undefined) unit.kind = changes.kind;
  if (changes.mountGroup !== undefined) unit.mountGroup = changes.mountGroup;
  if ('valveKind' in changes) {
    if (changes.valveKind) unit.valveKind = changes.valveKind;
    else delete unit.valveKind;
  }
});
