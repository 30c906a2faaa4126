import { portPosition, type CircuitDocument } from '@linesmith/routing';
import { unitSize } from '../unit-presets';
import type { Bounds } from '../view';

/** The box around every unit, corner and heat zone of the sketch (plus an optional background image). */
export function contentBounds(doc: CircuitDocument, image?: { width: number; height: number }): Bounds | null {
  const xs: number[] = [];
  const ys: number[] = [];
  const add = (x: number, y: number) => {
    xs.push(x);
    ys.push(y);
  };
  for (const unit of doc.units) {
    const { width, height } = unitSize(unit.kind);
    add(unit.x - width / 2, unit.y - height / 2);
    add(unit.x + width / 2, unit.y + height / 2);
    for (const port of unit.ports) {
      const p = portPosition(unit, port);
      add(p.x, p.y);
    }
  }
  for (const line of doc.lines) for (const p of line.points) add(p.x, p.y);
  for (const zone of doc.heatZones) for (const p of zone.polygon) add(p.x, p.y);
  if (image) {
    add(0, 0);
    add(image.width, image.height);
  }
  if (xs.length === 0) return null;
  return { minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) };
}
