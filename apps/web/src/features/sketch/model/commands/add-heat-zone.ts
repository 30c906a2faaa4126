import type { HeatZoneKind } from '@linesmith/routing';
import { command, newId } from './command';

export interface AddHeatZoneArgs {
  polygon: Array<{ x: number; y: number }>;
  kind?: HeatZoneKind;
  label?: string;
  id?: string;
}

/** Closes a drawn heat zone; its clearance follows the shop rules for its kind until set. */
export const addHeatZone = command<AddHeatZoneArgs>('Add heat zone', (draft, { polygon, kind = 'exhaust', label, id }) => {
  if (polygon.length < 3) throw new RangeError('A heat zone needs at least 3 points');
  draft.heatZones.push({
    id: id ?? newId(),
    label: label ?? (kind === 'exhaust' ? 'Exhaust' : kind === 'turbo' ? 'Turbo' : 'Hot part'),
    kind,
    polygon: polygon.map((p) => ({ x: p.x, y: p.y })),
  });
});
