import type { Vec } from './vec.js';
import { lerp } from './vec.js';
import { pointSegmentDistance, segmentIntersectionParams, segmentSegmentDistance, segmentWithinCapsule } from './segment.js';
import { mergeIntervals, type Interval } from './intervals.js';

/** Even-odd rule; points exactly on an edge may fall either way (callers use distances for that). */
export function pointInPolygon(p: Vec, polygon: readonly Vec[]): boolean {
  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const a = polygon[i];
    const b = polygon[j];
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

/** Distance from a point to a polygon's area: 0 inside. */
export function pointPolygonDistance(p: Vec, polygon: readonly Vec[]): number {
  if (pointInPolygon(p, polygon)) return 0;
  let best = Infinity;
  forEachEdge(polygon, (a, b) => {
    best = Math.min(best, pointSegmentDistance(p, a, b));
  });
  return best;
}

/** Distance from segment ab to a polygon's area: 0 when it crosses or lies inside. */
export function segmentPolygonDistance(a: Vec, b: Vec, polygon: readonly Vec[]): number {
  if (pointInPolygon(a, polygon)) return 0;
  let best = Infinity;
  forEachEdge(polygon, (e, f) => {
    best = Math.min(best, segmentSegmentDistance(a, b, e, f));
  });
  return best;
}

/** Parameter intervals of segment ab (0…1) inside the polygon, including where it runs along an edge. */
export function segmentInsidePolygon(a: Vec, b: Vec, polygon: readonly Vec[]): Interval[] {
  // Plain loops: the heat check calls this for every chord that enters a zone's box.
  const hits: number[] = [];
  for (let i = 0; i < polygon.length; i++) {
    const params = segmentIntersectionParams(a, b, polygon[i], polygon[(i + 1) % polygon.length]);
    for (let k = 0; k < params.length; k++) hits.push(params[k]);
  }
  if (hits.length === 0) return pointInPolygon(a, polygon) ? [{ start: 0, end: 1 }] : [];
  const cuts = [0, 1];
  for (let k = 0; k < hits.length; k++) cuts.push(hits[k]);
  cuts.sort((x, y) => x - y);
  const inside: Interval[] = [];
  for (let i = 0; i < cuts.length - 1; i++) {
    const s = cuts[i];
    const e = cuts[i + 1];
    if (e - s < 1e-12) continue;
    if (pointInPolygon(lerp(a, b, (s + e) / 2), polygon)) inside.push({ start: s, end: e });
  }
  // A touch at a single point (a corner grazing an edge) still counts as contact.
  if (inside.length === 0) inside.push({ start: hits[0], end: hits[0] });
  return mergeIntervals(inside);
}

/** Parameter intervals of segment ab (0…1) within `clearance` of the polygon's edges (unmerged). */
export function segmentNearEdges(a: Vec, b: Vec, polygon: readonly Vec[], clearance: number): Interval[] {
  const found: Interval[] = [];
  if (clearance > 0) {
    forEachEdge(polygon, (e, f) => {
      const range = segmentWithinCapsule(a, b, e, f, clearance);
      if (range) found.push({ start: range[0], end: range[1] });
    });
  }
  return found;
}

/** Parameter intervals of segment ab (0…1) within `clearance` of the polygon's area. */
export function segmentNearPolygon(a: Vec, b: Vec, polygon: readonly Vec[], clearance: number): Interval[] {
  return mergeIntervals([...segmentInsidePolygon(a, b, polygon), ...segmentNearEdges(a, b, polygon, clearance)]);
}

export interface Box {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export function boundingBox(points: readonly Vec[], grow = 0): Box {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const p of points) {
    if (p.x < minX) minX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.x > maxX) maxX = p.x;
    if (p.y > maxY) maxY = p.y;
  }
  return { minX: minX - grow, minY: minY - grow, maxX: maxX + grow, maxY: maxY + grow };
}

export const boxesOverlap = (p: Box, q: Box): boolean =>
  p.minX <= q.maxX && q.minX <= p.maxX && p.minY <= q.maxY && q.minY <= p.maxY;

function forEachEdge(polygon: readonly Vec[], visit: (a: Vec, b: Vec) => void): void {
  for (let i = 0; i < polygon.length; i++) visit(polygon[i], polygon[(i + 1) % polygon.length]);
}
