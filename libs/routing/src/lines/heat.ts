import type { Vec } from '../geometry/vec.js';
import { pathBounds, type RoutePath } from '../geometry/route-path.js';
import { boundingBox, boxesOverlap, segmentInsidePolygon, segmentNearEdges, type Box } from '../geometry/polygon.js';
import { clampIntervals, growIntervals, mergeIntervals, type Interval } from '../geometry/intervals.js';

export interface HeatZoneIn {
  id: string;
  polygon: readonly Vec[];
  clearanceIn: number;
}

export interface ZoneExposure {
  zoneId: string;
  /** Stretches of the route within the zone's clearance, in inches along the route. */
  near: Interval[];
  /** True when the route touches or enters the zone itself. */
  contact: boolean;
}

export interface HeatExposure {
  zones: ZoneExposure[];
  /** Merged stretches that need a sleeve. */
  required: Interval[];
  /** The required stretches plus the shop's overlap at each end, kept on the line. */
  planned: Interval[];
  contact: boolean;
}

interface PreparedZone extends HeatZoneIn {
  box: Box;
}

export const prepareZones = (zones: readonly HeatZoneIn[]): PreparedZone[] =>
  zones.map((z) => ({ ...z, box: boundingBox(z.polygon, z.clearanceIn) }));

/** Heat exposure of one route against the circuit's heat zones (all in inches). */
export function heatExposure(path: RoutePath, zones: readonly PreparedZone[], overlapIn: number): HeatExposure {
  const exposures: ZoneExposure[] = [];
  if (zones.length === 0 || path.count < 2) return { zones: exposures, required: [], planned: [], contact: false };
  const routeBox = pathBounds(path);
  const { xs, ys, s } = path;
  for (const zone of zones) {
    if (!boxesOverlap(routeBox, zone.box)) continue;
    const { minX, minY, maxX, maxY } = zone.box;
    const near: Interval[] = [];
    let contact = false;
    for (let i = 0; i < path.count - 1; i++) {
      // Most chords are far from every zone: reject them on their bounding box without allocating.
      const [ax, ay, bx, by] = [xs[i], ys[i], xs[i + 1], ys[i + 1]];
      if ((ax > bx ? ax : bx) < minX || (ax < bx ? ax : bx) > maxX) continue;
      if ((ay > by ? ay : by) < minY || (ay < by ? ay : by) > maxY) continue;
      const a = { x: ax, y: ay };
      const b = { x: bx, y: by };
      const s0 = s[i];
      const ds = s[i + 1] - s0;
      const inside = segmentInsidePolygon(a, b, zone.polygon);
      if (inside.length > 0) contact = true;
      for (const t of inside) near.push({ start: s0 + t.start * ds, end: s0 + t.end * ds });
      for (const t of segmentNearEdges(a, b, zone.polygon, zone.clearanceIn)) {
        near.push({ start: s0 + t.start * ds, end: s0 + t.end * ds });
      }
    }
    if (near.length > 0 || contact) exposures.push({ zoneId: zone.id, near: mergeIntervals(near), contact });
  }
  const required = mergeIntervals(exposures.flatMap((e) => e.near));
  const planned = mergeIntervals(clampIntervals(growIntervals(required, overlapIn), 0, path.lengthIn));
  return { zones: exposures, required, planned, contact: exposures.some((e) => e.contact) };
}
