import type { CircuitPort, CircuitUnit } from '../circuit/document.schema.js';
import type { PointPx } from '../geometry/units.js';

/** A port with its unit and sketch position, looked up by `unitId/portId`. */
export interface PortEntry {
  key: string;
  unit: CircuitUnit;
  port: CircuitPort;
  positionPx: PointPx;
}
