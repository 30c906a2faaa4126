import type { UnitKind } from '@linesmith/routing';
import { unitPresets } from '../unit-presets';
import { command, newId } from './command';

export interface AddUnitArgs {
  kind: UnitKind;
  x: number;
  y: number;
  /** Given by callers that need to select the new unit; a fresh UUID otherwise. */
  id?: string;
}

/** Places a unit from its palette preset, with the preset's ports. */
export const addUnit = command<AddUnitArgs>('Add unit', (draft, { kind, x, y, id }) => {
  const preset = unitPresets[kind];
  draft.units.push({
    id: id ?? newId(),
    kind,
    label: preset.label,
    x,
    y,
    rotation: 0,
    mountGroup: preset.mountGroup,
    ...(preset.valveKind ? { valveKind: preset.valveKind } : {}),
    ports: preset.ports.map((p) => ({
      id: newId(),
      label: p.label,
      role: p.role,
      connection: { ...p.connection },
      dx: p.dx,
      dy: p.dy,
    })),
  });
});
