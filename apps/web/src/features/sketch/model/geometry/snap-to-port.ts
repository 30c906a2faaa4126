import { distance, portPosition, type CircuitDocument, type PortRef } from '@linesmith/routing';
import type { Point } from '../tools';

/** How close (screen pixels) a click must come to a port to land on it. */
export const PORT_SNAP_SCREEN_PX = 10;

export interface SnappedPort extends PortRef {
  position: Point;
  distance: number;
}

/** The nearest port within `radius` sketch pixels of `point`, or null. */
export function findPortNear(doc: CircuitDocument, point: Point, radius: number): SnappedPort | null {
  let best: SnappedPort | null = null;
  for (const unit of doc.units) {
    for (const port of unit.ports) {
      const position = portPosition(unit, port);
      const d = distance(position, point);
      if (d <= radius && (!best || d < best.distance)) best = { unitId: unit.id, portId: port.id, position, distance: d };
    }
  }
  return best;
}

/** True when a line already ends on the port (a port takes one line). */
export const portTaken = (doc: CircuitDocument, ref: PortRef): boolean =>
  doc.lines.some((l) => [l.from, l.to].some((e) => e.unitId === ref.unitId && e.portId === ref.portId));
