import type { Vec } from '../geometry/vec.js';
import { pathBounds, type RoutePath } from '../geometry/route-path.js';
import { boundingBox, boxesOverlap, segmentInsidePolygon, type Box } from '../geometry/polygon.js';
import { segmentWithinCapsule } from '../geometry/segment.js';
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

interface PreparedEdge {
  e: Vec;
  f: Vec;
  /** The edge's box grown by the clearance: chords outside it cannot come near this edge. */
  box: Box;
}

interface PreparedZone extends HeatZoneIn {
  /** The zone's own box, and the box grown by the clearance. */
  area: Box;
  box: Box;
  edges: PreparedEdge[];
}

export const prepareZones = (zones: readonly HeatZoneIn[]): PreparedZone[] =>
  zones.map((z) => ({
    ...z,
    area: boundingBox(z.polygon),
    box: boundingBox(z.polygon, z.clearanceIn),
    edges: z.polygon.map((e, i) => {
      const f = z.polygon[(i + 1) % z.polygon.length];
      return { e, f, box: boundingBox([e, f], z.clearanceIn) };
    }),
  }));

const chordMisses = (ax: number, ay: number, bx: number, by: number, box: Box): boolean =>
  (ax > bx ? ax : bx) < box.minX ||
  (ax < bx ? ax : bx) > box.maxX ||
  (ay > by ? ay : by) < box.minY ||
  (ay < by ? ay : by) > box.maxY;

/** Heat exposure of one route against the circuit's heat zones (all in inches). */
export function heatExposure(path: RoutePath, zones: readonly PreparedZone[], overlapIn: number): HeatExposure {
  const exposures: ZoneExposure[] = [];
  if (zones.length === 0 || path.count < 2) return { zones: exposures, required: [], planned: [], contact: false };
  const routeBox = pathBounds(path);
  const { xs, ys, s } = path;
  for (const zone of zones) {
    if (!boxesOverlap(routeBox, zone.box)) continue;
    const near: Interval[] = [];
    let contact = false;
    for (let i = 0; i < path.count - 1; i++) {
      // Most chords are far from every zone: reject them on bounding boxes before any allocation.
      const ax = xs[i];
      const ay = ys[i];
      const bx = xs[i + 1];
      const by = ys[i + 1];
      if (chordMisses(ax, ay, bx, by, zone.box)) continue;
      const a = { x: ax, y: ay };
      const b = { x: bx, y: by };
      const s0 = s[i];
      const ds = s[i + 1] - s0;
      if (!chordMisses(ax, ay, bx, by, zone.area)) {
        const inside = segmentInsidePolygon(a, b, zone.polygon);
        if (inside.length > 0) contact = true;
        for (const t of inside) near.push({ start: s0 + t.start * ds, end: s0 + t.end * ds });
      }
      if (zone.clearanceIn <= 0) continue;
      for (const edge of zone.edges) {
        if (chordMisses(ax, ay, bx, by, edge.box)) continue;
        const t = segmentWithinCapsule(a, b, edge.e, edge.f, zone.clearanceIn);
        if (t) near.push({ start: s0 + t[0] * ds, end: s0 + t[1] * ds });
      }
    }
    if (near.length > 0 || contact) exposures.push({ zoneId: zone.id, near: mergeIntervals(near), contact });
  }
  const required = mergeIntervals(exposures.flatMap((e) => e.near));
  const planned = mergeIntervals(clampIntervals(growIntervals(required, overlapIn), 0, path.lengthIn));
  return { zones: exposures, required, planned, contact: exposures.some((e) => e.contact) };
}
