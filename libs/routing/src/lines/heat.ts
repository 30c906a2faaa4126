import type { Vec } from '../geometry/vec.js';
import { pathBounds, type RoutePath } from '../geometry/route-path.js';
import Flatbush from 'flatbush';
import { boundingBox, boxesOverlap, type Box } from '../geometry/polygon.js';
import { chordInsidePolygon } from '../geometry/polygon-flat.js';
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

/** Zones with more edges than this get their own index of edges (smaller ones are scanned). */
const EDGE_INDEX_MIN = 24;
/** Circuits with more zones than this get an index of zone boxes (fewer are scanned). */
const ZONE_INDEX_MIN = 8;

/**
 * A heat zone ready for the heat check: flat coordinates, each edge's box grown by the clearance
 * (4 numbers per edge) and its capsule for chordWithinCapsule (5 per edge), all in inches.
 */
export interface PreparedZone extends HeatZoneIn {
  /** The zone's own box, and the box grown by the clearance. */
  area: Box;
  box: Box;
  pointCount: number;
  xs: Float64Array;
  ys: Float64Array;
  edgeBoxes: Float64Array;
  capsules: Float64Array;
  /** R-tree of the edge boxes, for zones with many edges. */
  edgeIndex: Flatbush | null;
}

/** A circuit's heat zones, prepared once per evaluation (or once per zones version, see createEvaluator). */
export interface PreparedZones {
  list: PreparedZone[];
  /** R-tree of the zones' grown boxes, for circuits with many zones. */
  index: Flatbush | null;
}

function prepareZone(z: HeatZoneIn): PreparedZone {
  const n = z.polygon.length;
  const xs = new Float64Array(n);
  const ys = new Float64Array(n);
  const edgeBoxes = new Float64Array(4 * n);
  const capsules = new Float64Array(5 * n);
  for (let i = 0; i < n; i++) {
    const e = z.polygon[i];
    const f = z.polygon[(i + 1) % n];
    xs[i] = e.x;
    ys[i] = e.y;
    const box = boundingBox([e, f], z.clearanceIn);
    edgeBoxes.set([box.minX, box.minY, box.maxX, box.maxY], 4 * i);
    capsules.set([e.x, e.y, f.x, f.y, z.clearanceIn], 5 * i);
  }
  let edgeIndex: Flatbush | null = null;
  if (n > EDGE_INDEX_MIN) {
    edgeIndex = new Flatbush(n);
    for (let i = 0; i < n; i++) edgeIndex.add(edgeBoxes[4 * i], edgeBoxes[4 * i + 1], edgeBoxes[4 * i + 2], edgeBoxes[4 * i + 3]);
    edgeIndex.finish();
  }
  return { ...z, area: boundingBox(z.polygon), box: boundingBox(z.polygon, z.clearanceIn), pointCount: n, xs, ys, edgeBoxes, capsules, edgeIndex };
}

export function prepareZones(zones: readonly HeatZoneIn[]): PreparedZones {
  const list = zones.map(prepareZone);
  let index: Flatbush | null = null;
  if (list.length > ZONE_INDEX_MIN) {
    index = new Flatbush(list.length);
    for (const z of list) index.add(z.box.minX, z.box.minY, z.box.maxX, z.box.maxY);
    index.finish();
  }
  return { list, index };
}

/**
 * Appends [start, end], widening the last interval instead when it starts within it: stretches
 * arrive roughly in route order, so this keeps the list short; mergeIntervals finishes the union
 * (the union does not depend on the order the stretches arrive in).
 */
function addNear(near: Interval[], start: number, end: number): void {
  const last = near.length > 0 ? near[near.length - 1] : undefined;
  if (last && start >= last.start && start <= last.end) {
    if (end > last.end) last.end = end;
  } else {
    near.push({ start, end });
  }
}

/** Scratch for the chord tests, shared by every call (creating typed arrays per route costs more). */
const CHORD = new Float64Array(4);
const RANGE = new Float64Array(2);
let inside: Float64Array = new Float64Array(64);
const ALL_ZONES: number[] = [];

/** Zone numbers whose grown box meets the route's box, in zone order. */
function zonesNear(zones: PreparedZones, minX: number, minY: number, maxX: number, maxY: number): readonly number[] {
  if (zones.index) return zones.index.search(minX, minY, maxX, maxY).sort((a, b) => a - b);
  while (ALL_ZONES.length < zones.list.length) ALL_ZONES.push(ALL_ZONES.length);
  return ALL_ZONES;
}

/**
 * Heat exposure of one route against the circuit's heat zones (all in inches). Only zones whose
 * box meets the route's box are looked at, only chords within a zone's box are tested, and in a
 * zone with many edges only the edges whose boxes meet the chord's (found through the R-tree).
 */
export function heatExposure(path: RoutePath, zones: PreparedZones, overlapIn: number): HeatExposure {
  const exposures: ZoneExposure[] = [];
  const zoneCount = zones.list.length;
  if (zoneCount === 0 || path.count < 2) return { zones: exposures, required: [], planned: [], contact: false };
  const routeBox = pathBounds(path);
  const { xs, ys, s } = path;
  const range = RANGE;
  const chord = CHORD;
  const near_ = zonesNear(zones, routeBox.minX, routeBox.minY, routeBox.maxX, routeBox.maxY);
  const candidates = near_ === ALL_ZONES ? zoneCount : near_.length;
  for (let c = 0; c < candidates; c++) {
    const zone = zones.list[near_[c]];
    if (!boxesOverlap(routeBox, zone.box)) continue;
    const near: Interval[] = [];
    let contact = false;
    const zoneBox = zone.box;
    const area = zone.area;
    const edgeBoxes = zone.edgeBoxes;
    const n = zone.pointCount;
    if (inside.length < 2 * (n + 1)) inside = new Float64Array(2 * (n + 1));
    for (let i = 0; i < path.count - 1; i++) {
      // Most chords are far from every zone: reject them on bounding boxes before anything else.
      const ax = xs[i];
      const ay = ys[i];
      const bx = xs[i + 1];
      const by = ys[i + 1];
      const x0 = ax < bx ? ax : bx;
      const x1 = ax < bx ? bx : ax;
      const y0 = ay < by ? ay : by;
      const y1 = ay < by ? by : ay;
      // Box tests written out: a call that is not inlined would box its four numbers each time.
      if (x1 < zoneBox.minX || x0 > zoneBox.maxX || y1 < zoneBox.minY || y0 > zoneBox.maxY) continue;
      chord[0] = ax;
      chord[1] = ay;
      chord[2] = bx;
      chord[3] = by;
      const s0 = s[i];
      const ds = s[i + 1] - s0;
      if (x1 >= area.minX && x0 <= area.maxX && y1 >= area.minY && y0 <= area.maxY) {
        const found = chordInsidePolygon(chord, zone.xs, zone.ys, n, inside);
        if (found > 0) contact = true;
        for (let k = 0; k < found; k++) addNear(near, s0 + inside[2 * k] * ds, s0 + inside[2 * k + 1] * ds);
        // A chord wholly inside the zone is wholly near it: the edges cannot add to [0, 1].
        if (found === 1 && inside[0] === 0 && inside[1] === 1) continue;
      }
      if (zone.clearanceIn <= 0) continue;
      if (zone.edgeIndex) {
        const edges = zone.edgeIndex.search(x0, y0, x1, y1);
        for (let k = 0; k < edges.length; k++) {
          if (!chordWithinCapsule(chord, zone.capsules, range, 5 * edges[k])) continue;
          addNear(near, s0 + range[0] * ds, s0 + range[1] * ds);
          if (range[0] === 0 && range[1] === 1) break; // the whole chord is near: no edge can add to it
        }
        continue;
      }
      for (let e = 0; e < n; e++) {
        const b = 4 * e;
        if (x1 < edgeBoxes[b] || x0 > edgeBoxes[b + 2] || y1 < edgeBoxes[b + 1] || y0 > edgeBoxes[b + 3]) continue;
        if (!chordWithinCapsule(chord, zone.capsules, range, 5 * e)) continue;
        addNear(near, s0 + range[0] * ds, s0 + range[1] * ds);
        if (range[0] === 0 && range[1] === 1) break; // the whole chord is near: no edge can add to it
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
