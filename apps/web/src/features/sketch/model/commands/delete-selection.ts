import type { Selection } from '../selection';
import { command } from './command';

/** Deletes everything selected: units (with their lines), ports (with their line), lines, corners, zones. */
export const deleteSelection = command<{ selection: Selection }>('Delete', (draft, { selection }) => {
  const units = new Set<string>();
  const lines = new Set<string>();
  const zones = new Set<string>();
  const ports = new Set<string>();
  const corners = new Map<string, Set<number>>();
  for (const item of selection) {
    if (item.kind === 'unit') units.add(item.id);
    else if (item.kind === 'line') lines.add(item.id);
    else if (item.kind === 'zone') zones.add(item.id);
    else if (item.kind === 'port') ports.add(`${item.unitId}/${item.id}`);
    else corners.set(item.lineId, (corners.get(item.lineId) ?? new Set()).add(item.index));
  }
  const gone = (ref: { unitId: string; portId: string }) => units.has(ref.unitId) || ports.has(`${ref.unitId}/${ref.portId}`);
  draft.units = draft.units.filter((u) => !units.has(u.id));
  for (const unit of draft.units) unit.ports = unit.ports.filter((p) => !ports.has(`${unit.id}/${p.id}`));
  draft.lines = draft.lines.filter((l) => !lines.has(l.id) && !gone(l.from) && !gone(l.to));
  for (const line of draft.lines) {
    const drop = corners.get(line.id);
    if (drop) line.points = line.points.filter((_, i) => !drop.has(i));
  }
  draft.heatZones = draft.heatZones.filter((z) => !zones.has(z.id));
});
