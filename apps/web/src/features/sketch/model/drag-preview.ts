import type { CircuitDocument, Flag } from '@linesmith/routing';
import { moveCorner } from './commands/move-corner';
import { cornersMove, moveSelection } from './commands/move-selection';
import { beginGesture, endGesture, execute, type DocumentHistory } from './history';
import { selectedIds, type Selection } from './selection';
import type { Point } from './tools';

/**
 * What a drag moves: the selection (units, heat zones, lines) or one corner of a line.
 * While the pointer moves only the offset changes; the document and its history change once, on
 * pointer up, so a drag over a large sketch neither records a patch nor re-checks the circuit per move.
 */
export type DragTarget =
  | { kind: 'selection'; selection: Selection }
  | { kind: 'corner'; lineId: string; index: number; from: Point };

export interface DragPreview {
  /** The undo step's name. */
  label: string;
  target: DragTarget;
  dx: number;
  dy: number;
}

/** The ids of everything a drag redraws: moved units and zones, and every line whose route changes. */
export interface DragFootprint {
  units: ReadonlySet<string>;
  zones: ReadonlySet<string>;
  lines: ReadonlySet<string>;
}

export function dragFootprint(doc: CircuitDocument, target: DragTarget): DragFootprint {
  if (target.kind === 'corner') return { units: new Set(), zones: new Set(), lines: new Set([target.lineId]) };
  const ids = selectedIds(target.selection);
  const units = new Set(doc.units.filter((u) => ids.units.has(u.id)).map((u) => u.id));
  const zones = new Set(doc.heatZones.filter((z) => ids.zones.has(z.id)).map((z) => z.id));
  const lines = new Set(
    doc.lines.filter((l) => units.has(l.from.unitId) || units.has(l.to.unitId) || cornersMove(l, ids)).map((l) => l.id),
  );
  return { units, zones, lines };
}

/** The document as it will be when the drag is dropped here; untouched items keep their identity. */
export function previewDocument(doc: CircuitDocument, drag: DragPreview): CircuitDocument {
  const { target, dx, dy } = drag;
  if (target.kind === 'corner') {
    const point = doc.lines.find((l) => l.id === target.lineId)?.points[target.index];
    if (!point) return doc;
    const x = target.from.x + dx;
    const y = target.from.y + dy;
    return {
      ...doc,
      lines: doc.lines.map((l) =>
        l.id === target.lineId ? { ...l, points: l.points.map((p, i) => (i === target.index ? { ...p, x, y } : p)) } : l,
      ),
    };
  }
  const ids = selectedIds(target.selection);
  const shift = <P extends Point>(p: P): P => ({ ...p, x: p.x + dx, y: p.y + dy });
  return {
    ...doc,
    units: doc.units.map((u) => (ids.units.has(u.id) ? shift(u) : u)),
    heatZones: doc.heatZones.map((z) => (ids.zones.has(z.id) ? { ...z, polygon: z.polygon.map(shift) } : z)),
    lines: doc.lines.map((l) => (cornersMove(l, ids) ? { ...l, points: l.points.map(shift) } : l)),
  };
}

/** Drops a drag into the history: one command, one undo step named after the drag; none when nothing moved. */
export function dropDrag(history: DocumentHistory, drag: DragPreview): DocumentHistory {
  const { target, dx, dy } = drag;
  if (dx === 0 && dy === 0) return history;
  const gesture = beginGesture(history, drag.label);
  const moved =
    target.kind === 'corner'
      ? execute(gesture, moveCorner, { lineId: target.lineId, index: target.index, x: target.from.x + dx, y: target.from.y + dy })
      : execute(gesture, moveSelection, { selection: target.selection, dx, dy });
  return endGesture(moved);
}

/** The flags whose markers follow the drag (the same lookup as flagPosition: line, then unit, then zone). */
export function flagsFollowingDrag(doc: CircuitDocument, flags: readonly Flag[], footprint: DragFootprint): ReadonlySet<Flag> {
  const lines = new Set(doc.lines.map((l) => l.id));
  const units = new Set(doc.units.map((u) => u.id));
  const follows = (t: Flag['target']): boolean => {
    const lineId = t.kind === 'line' ? t.id : t.lineId;
    if (lineId && lines.has(lineId)) return footprint.lines.has(lineId);
    const unitId = t.kind === 'unit' ? t.id : t.unitId;
    if (unitId && units.has(unitId)) return footprint.units.has(unitId);
    return t.kind === 'zone' && footprint.zones.has(t.id);
  };
  return new Set(flags.filter((f) => follows(f.target)));
}
