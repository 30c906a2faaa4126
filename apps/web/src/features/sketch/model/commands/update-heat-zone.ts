import type { HeatZoneKind } from '@linesmith/routing';
import { byId, command } from './command';

export interface UpdateHeatZoneArgs {
  zoneId: string;
  changes: {
    label?: string;
    kind?: HeatZoneKind;
    /** Inches; null goes back to the shop's clearance for the kind. */
    clearanceIn?: number | null;
    /** A heat shield stands between the hot part and the lines (contact becomes a caution). */
    shielded?: boolean;
    polygon?: Array<{ x: number; y: number }>;
  };
}

export const updateHeatZone = command<UpdateHeatZoneArgs>('Edit heat zone', (draft, { zoneId, changes }) => {
  const zone = byId(draft.heatZones, zoneId, 'heat zone');
  if (changes.label !== undefined) zone.label = changes.label;
  if (changes.kind !== undefined) zone.kind = changes.kind;
  if (changes.clearanceIn === null) delete zone.clearanceIn;
  else if (changes.clearanceIn !== undefined) {
    if (!(changes.clearanceIn >= 0)) throw new RangeError('A clearance is 0 or more inches');
    zone.clearanceIn = changes.clearanceIn;
  }
  if (changes.shielded === true) zone.shielded = true;
  else if (changes.shielded === false) delete zone.shielded;
  if (changes.polygon) {
    if (changes.polygon.length < 3) throw new RangeError('A heat zone needs at least 3 points');
    zone.polygon = changes.polygon.map((p) => ({ x: p.x, y: p.y }));
  }
});
