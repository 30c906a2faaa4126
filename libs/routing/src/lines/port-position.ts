import type { CircuitPort, CircuitUnit } from '../circuit/document.schema.js';
import { pointPx, type PointPx } from '../geometry/units.js';
import { rotate } from '../geometry/vec.js';

/** A port's position on the sketch: the unit's position plus the port offset turned with the unit. */
export function portPosition(unit: CircuitUnit, port: CircuitPort): PointPx {
  const offset = rotate({ x: port.dx, y: port.dy }, unit.rotation);
  return pointPx(unit.x + offset.x, unit.y + offset.y);
}
