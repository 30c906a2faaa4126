import {
  centrelineDetail,
  distanceAlong,
  pointAt,
  pointSegmentDistance,
  portPosition,
  routePath,
  type CircuitDocument,
  type CircuitLine,
  type CircuitUnit,
  type RoutePath,
} from '@linesmith/routing';
import type { Point } from '../tools';

/** What a route needs of the document: its units (a line's shape passes just its two). */
export type UnitsOf = Pick<CircuitDocument, 'units'>;

/** The line's route in sketch pixels: from-port, corners, to-port; null when a port is missing. */
export function routePx(doc: UnitsOf, line: CircuitLine): Point[] | null {
  const end = (ref: CircuitLine['from']) => {
    const unit = doc.units.find((u) => u.id === ref.unitId);
    const port = unit?.ports.find((p) => p.id === ref.portId);
    return unit && port ? portPosition(unit, port) : null;
  };
  const a = end(line.from);
  const b = end(line.to);
  if (!a || !b) return null;
  return [a, ...line.points.map((p) => ({ x: p.x, y: p.y })), b];
}

/** The units at a line's two ends, looked up by id (what LineShape draws the line between). */
export function lineEnds(unitsById: ReadonlyMap<string, CircuitUnit>, line: CircuitLine): { from: CircuitUnit | undefined; to: CircuitUnit | undefined } {
  return { from: unitsById.get(line.from.unitId), to: unitsById.get(line.to.unitId) };
}

/** Units by id, for lineEnds. */
export const unitsById = (doc: UnitsOf): ReadonlyMap<string, CircuitUnit> => new Map(doc.units.map((u) => [u.id, u]));

/** Index of the route segment nearest to `p` (segment i runs from route point i to i + 1). */
export function nearestSegment(route: readonly Point[], p: Point): { index: number; distance: number } {
  let best = { index: 0, distance: Infinity };
  for (let i = 0; i < route.length - 1; i++) {
    const d = pointSegmentDistance(p, route[i], route[i + 1]);
    if (d < best.distance) best = { index: i, distance: d };
  }
  return best;
}

/**
 * The line's centreline (with its bends) as a path in inches, and the factor from path inches to
 * the basis length (a measured length stretches the drawn route evenly, as the routing lib does).
 */
export interface LinePathIn {
  path: RoutePath;
  stretch: number;
}

export function linePathIn(doc: UnitsOf, line: CircuitLine, pxPerIn: number, basisIn: number | null): LinePathIn | null {
  const route = routePx(doc, line);
  if (!route || !(pxPerIn > 0)) return null;
  const detail = centrelineDetail(
    route.map((p) => ({ x: p.x / pxPerIn, y: p.y / pxPerIn })),
    [0, ...line.points.map((p) => p.bendRadiusIn), 0],
  );
  const path = routePath(detail);
  const stretch = basisIn !== null && path.lengthIn > 0 ? basisIn / path.lengthIn : 1;
  return { path, stretch };
}

/** Sketch position of a point `atIn` along the line (basis inches). */
export function positionAlong(geometry: LinePathIn, atIn: number, pxPerIn: number): Point {
  const p = pointAt(geometry.path, atIn / geometry.stretch);
  return { x: p.x * pxPerIn, y: p.y * pxPerIn };
}

/** Distance along the line (basis inches) of the route point nearest to a sketch point. */
export function distanceAlongLine(geometry: LinePathIn, sketch: Point, pxPerIn: number): number {
  return distanceAlong(geometry.path, { x: sketch.x / pxPerIn, y: sketch.y / pxPerIn }) * geometry.stretch;
}

/** The drawn route with its bends as flat sketch coordinates, for Konva's Line. */
export function pathPoints(geometry: LinePathIn, pxPerIn: number): number[] {
  const { xs, ys, count } = geometry.path;
  const flat: number[] = [];
  for (let i = 0; i < count; i++) flat.push(xs[i] * pxPerIn, ys[i] * pxPerIn);
  return flat;
}
