import type { Draft } from 'immer';
import type { CircuitDocument } from '@linesmith/routing';
import { current, isDraft } from 'immer';
import type { Selection } from '../selection';
import { selectedIds } from '../selection';
import { command, newId } from './command';

export interface DuplicateSelectionArgs {
  selection: Selection;
  /** Where the copies go, relative to the originals, in sketch pixels. */
  offset?: { x: number; y: number };
  /** Filled with old id → new id of every copied unit, line and zone, so the caller can select the copies. */
  idMap?: Map<string, string>;
}

const plain = <T>(value: T): T => structuredClone(isDraft(value) ? (current(value as Draft<T>) as T) : value);

/**
 * Copies the selected units (with fresh port ids), heat zones, and every line whose two units were
 * both copied (joined to the copies). Hoses and end stacks come along; supports and sleeves get new ids.
 */
export const duplicateSelection = command<DuplicateSelectionArgs>(
  'Duplicate',
  (draft: Draft<CircuitDocument>, { selection, offset = { x: 24, y: 24 }, idMap = new Map() }) => {
    const ids = selectedIds(selection);
    const portIds = new Map<string, string>();
    for (const unit of draft.units.filter((u) => ids.units.has(u.id))) {
      const copy = plain(unit);
      copy.id = newId();
      idMap.set(unit.id, copy.id);
      copy.x += offset.x;
      copy.y += offset.y;
      for (const port of copy.ports) {
        const fresh = newId();
        portIds.set(`${unit.id}/${port.id}`, fresh);
        port.id = fresh;
      }
      draft.units.push(copy);
    }
    for (const line of draft.lines.filter((l) => ids.units.has(l.from.unitId) && ids.units.has(l.to.unitId))) {
      const copy = plain(line);
      copy.id = newId();
      idMap.set(line.id, copy.id);
      for (const end of [copy.from, copy.to]) {
        end.portId = portIds.get(`${end.unitId}/${end.portId}`)!;
        end.unitId = idMap.get(end.unitId)!;
      }
      for (const p of copy.points) {
        p.x += offset.x;
        p.y += offset.y;
      }
      copy.supports = copy.supports.map((s) => ({ ...s, id: newId() }));
      copy.sleeves = copy.sleeves.map((s) => ({ ...s, id: newId() }));
      draft.lines.push(copy);
    }
    for (const zone of draft.heatZones.filter((z) => ids.zones.has(z.id))) {
      const copy = plain(zone);
      copy.id = newId();
      idMap.set(zone.id, copy.id);
      copy.polygon = copy.polygon.map((p) => ({ x: p.x + offset.x, y: p.y + offset.y }));
      draft.heatZones.push(copy);
    }
  },
);
