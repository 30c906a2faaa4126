import type { Vec } from '../geometry/vec.js';
import type { RoutePath } from '../geometry/route-path.js';
import { boundingBox, boxesOverlap, segmentInsidePolygon, segmentNearPolygon, type Box } from '../geometry/polygon.js';
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
  const routeBox = boundingBox(path.points);
  for (const zone of zones) {
    if (!boxesOverlap(routeBox, zone.box)) continue;
    const near: Interval[] = [];
    let contact = false;
    for (let i = 0; i < path.points.length - 1; i++) {
      const a = path.points[i];
      const b = path.points[i + 1];
      const chordBox: Box = {
        minX: Math.min(a.x, b.x),
        minY: Math.min(a.y, b.y),
        maxX: Math.max(a.x, b.x),
        maxY: Math.max(a.y, b.y),
      };
      if (!boxesOverlap(chordBox, zone.box)) continue;
      const s0 = path.s[i];
      const ds = path.s[i + 1] - s0;
      for (const t of segmentNearPolygon(a, b, zone.polygon, zone.clearanceIn)) {
        near.push({ start: s0 + t.start * ds, end: s0 + t.end * ds });
      }
      if (!contact && segmentInsidePolygon(a, b, zone.polygon).length > 0) contact = true;
    }
    if (near.length > 0 || contact) exposures.push({ zoneId: zone.id, near: mergeIntervals(near), contact });
  }
  const required = mergeIntervals(exposures.flatMap((e) => e.near));
  const planned = mergeIntervals(clampIntervals(growIntervals(required, overlapIn), 0, path.lengthIn));
  return { zones: exposures, required, planned, contact: exposures.some((e) => e.contact) };
}
