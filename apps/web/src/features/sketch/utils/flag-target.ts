import { portPosition, type CircuitDocument, type Flag } from '@linesmith/routing';
import { routePx } from '../model/geometry/line-route';
import type { SelectedItem } from '../model/selection';
import type { Point } from '../model/tools';

/** The sketch item a flag points at, for selecting it from the flags panel. */
export function flagItem(flag: Flag): SelectedItem | null {
  const t = flag.target;
  switch (t.kind) {
    case 'line':
      return { kind: 'line', id: t.id };
    case 'joint':
      return t.lineId ? { kind: 'line', id: t.lineId } : t.unitId ? { kind: 'unit', id: t.unitId } : null;
    case 'port':
      return t.unitId ? { kind: 'port', unitId: t.unitId, id: t.id } : null;
    case 'zone':
      return { kind: 'zone', id: t.id };
    case 'unit':
      return { kind: 'unit', id: t.id };
    case 'circuit':
      return null;
  }
}

/** Where on the sketch a flag's marker sits: the joint's port, the middle of a line, a zone's first corner. */
export function flagPosition(doc: CircuitDocument, flag: Flag): Point | null {
  const t = flag.target;
  const lineId = t.kind === 'line' ? t.id : t.lineId;
  const line = lineId ? doc.lines.find((l) => l.id === lineId) : undefined;
  if (line) {
    const route = routePx(doc, line);
    if (!route) return null;
    if (t.kind === 'joint' && t.end) return t.end === 'from' ? route[0] : route[route.length - 1];
    if (t.index !== undefined && t.index > 0 && t.index < route.length - 1) return route[t.index];
    const mid = Math.floor((route.length - 1) / 2);
    const a = route[mid];
    const b = route[mid + 1] ?? a;
    return { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 };
  }
  const unitId = t.kind === 'unit' ? t.id : t.unitId;
  const unit = unitId ? doc.units.find((u) => u.id === unitId) : undefined;
  if (unit) {
    const port = t.kind === 'port' ? unit.ports.find((p) => p.id === t.id) : undefined;
    return port ? portPosition(unit, port) : { x: unit.x, y: unit.y };
  }
  if (t.kind === 'zone') {
    const zone = doc.heatZones.find((z) => z.id === t.id);
    return zone ? zone.polygon[0] : null;
  }
  return null;
}
