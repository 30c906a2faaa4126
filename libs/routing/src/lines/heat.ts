import type { Vec } from '../geometry/vec.js';
import { pathBounds, type RoutePath } from '../geometry/route-path.js';
import { boundingBox, boxesOverlap, segmentInsidePolygon, type Box } from '../geometry/polygon.js';
import { chordWithinCapsule } from '../geometry/segment.js';
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
  /** [ex, ey, fx, fy, clearance] for chordWithinCapsule. */
  capsule: Float64Array;
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
      return { capsule: Float64Array.of(e.x, e.y, f.x, f.y, z.clearanceIn), box: boundingBox([e, f], z.clearanceIn) };
    }),
  }));

/**
 * Appends [start, end], widening the last interval instead when it starts within it: stretches
 * arrive roughly in route order, so this keeps the list short; mergeIntervals finishes the union.
 */
function addNear(near: Interval[], start: number, end: number): void {
  const last = near.length > 0 ? near[near.length - 1] : undefined;
  if (last && start >= last.start && start <= last.end) {
    if (end > last.end) last.end = end;
  } else {
    near.push({ start, end });
  }
}

/** Scratch for chordWithinCapsule, shared by every call (creating typed arrays per route costs more). */
const CHORD = new Float64Array(4);
const RANGE = new Float64Array(2);

/** Heat exposure of one route against the circuit's heat zones (all in inches). */
export function heatExposure(path: RoutePath, zones: readonly PreparedZone[], overlapIn: number): HeatExposure {
  const exposures: ZoneExposure[] = [];
  if (zones.length === 0 || path.count < 2) return { zones: exposures, required: [], planned: [], contact: false };
  const routeBox = pathBounds(path);
  const { xs, ys, s } = path;
  const range = RANGE;
  const chord = CHORD;
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
      const x0 = ax < bx ? ax : bx;
      const x1 = ax < bx ? bx : ax;
      const y0 = ay < by ? ay : by;
      const y1 = ay < by ? by : ay;
      // Box tests written out: a call that is not inlined would box its four numbers each time.
      if (x1 < zone.box.minX || x0 > zone.box.maxX || y1 < zone.box.minY || y0 > zone.box.maxY) continue;
      chord[0] = ax;
      chord[1] = ay;
      chord[2] = bx;
      chord[3] = by;
      const s0 = s[i];
      const ds = s[i + 1] - s0;
      if (x1 >= zone.area.minX && x0 <= zone.area.maxX && y1 >= zone.area.minY && y0 <= zone.area.maxY) {
        const inside = segmentInsidePolygon({ x: ax, y: ay }, { x: bx, y: by }, zone.polygon);
        if (inside.length > 0) contact = true;
        for (const t of inside) addNear(near, s0 + t.start * ds, s0 + t.end * ds);
      }
      if (zone.clearanceIn <= 0) continue;
      for (const edge of zone.edges) {
        if (x1 < edge.box.minX || x0 > edge.box.maxX || y1 < edge.box.minY || y0 > edge.box.maxY) continue;
        if (chordWithinCapsule(chord, edge.capsule, range)) {
          addNear(near, s0 + range[0] * ds, s0 + range[1] * ds);
        }
      }
    }
    if (near.length > 0 || contact) exposures.push({ zoneId: zone.id, near: mergeIntervals(near), contact });
  }
  const allNear: Interval[] = [];
  let contact = false;
  for (const e of exposures) {
    for (const i of e.near) allNear.push(i);
    if (e.contact) contact = true;
  }
  const required = mergeIntervals(allNear);
  const planned = mergeIntervals(clampIntervals(growIntervals(required, overlapIn), 0, path.lengthIn));
  return { zones: exposures, required, planned, contact };
}
