import { norm, type Vec } from './vec.js';
import type { CentrelineDetail } from './centreline.js';

/** Largest angle one chord of a bend may span when a bend is drawn as straight pieces. */
const MAX_CHORD_RAD = Math.PI / 12;

/**
 * The route as a polyline whose vertices carry their true distance along the centreline (`s`):
 * straight legs between tangent points, and each bend as short chords. Positions along a line
 * (supports, sleeves, heat intervals) are all measured in this `s`. Stored in flat number arrays:
 * a large circuit has tens of thousands of vertices per evaluation.
 */
export interface RoutePath {
  xs: number[];
  ys: number[];
  s: number[];
  count: number;
  lengthIn: number;
}

const piecesOf = (deflectionRad: number) => Math.max(1, Math.ceil(deflectionRad / MAX_CHORD_RAD));

/** Builds the path of a centreline. A route whose bends do not fit is walked through its sharp corners. */
export function routePath(detail: CentrelineDetail): RoutePath {
  const path = fillRoutePath(detail, { xs: [], ys: [], s: [], count: 0, lengthIn: 0 });
  path.xs.length = path.count;
  path.ys.length = path.count;
  path.s.length = path.count;
  return path;
}

/**
 * routePath written into `path`, whose arrays are reused: only the first `count` entries are this
 * route's. The evaluation works each line's path out in one scratch path it does not keep.
 */
export function fillRoutePath(detail: CentrelineDetail, path: RoutePath): RoutePath {
  const { points: corners, bends, fits } = detail;
  // Plain arrays, and the steps written out: typed arrays cost more to create than these few
  // dozen numbers, and helper calls that V8 does not inline box every coordinate.
  const { xs, ys, s } = path;
  path.count = 0;
  path.lengthIn = 0;
  if (corners.length === 0) return path;
  xs[0] = corners[0].x;
  ys[0] = corners[0].y;
  s[0] = 0;
  let count = 1;
  for (let i = 1; i < corners.length; i++) {
    const corner = corners[i];
    const bend = fits && i < corners.length - 1 ? bends[i - 1] : undefined;
    const straight = !bend || bend.tangentIn === 0;
    const prev = corners[i - 1];
    const inLen = Math.sqrt((corner.x - prev.x) * (corner.x - prev.x) + (corner.y - prev.y) * (corner.y - prev.y));
    const ix = (corner.x - prev.x) / inLen;
    const iy = (corner.y - prev.y) / inLen;
    // The straight run up to the corner, or to where its bend starts.
    const toX = straight ? corner.x : corner.x - ix * bend.tangentIn;
    const toY = straight ? corner.y : corner.y - iy * bend.tangentIn;
    const last = count - 1;
    const run = Math.sqrt((toX - xs[last]) * (toX - xs[last]) + (toY - ys[last]) * (toY - ys[last]));
    if (run > 1e-12) {
      xs[count] = toX;
      ys[count] = toY;
      s[count] = s[last] + run;
      count++;
    }
    if (straight) continue;
    const next = corners[i + 1];
    const outLen = Math.sqrt((next.x - corner.x) * (next.x - corner.x) + (next.y - corner.y) * (next.y - corner.y));
    const ox = (next.x - corner.x) / outLen;
    const oy = (next.y - corner.y) / outLen;
    const turn = Math.sign(ix * oy - iy * ox);
    const cx = toX - iy * turn * bend.radiusIn;
    const cy = toY + ix * turn * bend.radiusIn;
    const a0 = Math.atan2(toY - cy, toX - cx);
    const pieces = piecesOf(bend.deflectionRad);
    for (let k = 1; k <= pieces; k++) {
      const a = a0 + (turn * bend.deflectionRad * k) / pieces;
      xs[count] = cx + bend.radiusIn * Math.cos(a);
      ys[count] = cy + bend.radiusIn * Math.sin(a);
      s[count] = s[count - 1] + bend.arcIn / pieces;
      count++;
    }
  }
  path.count = count;
  path.lengthIn = s[count - 1];
  return path;
}

/** Point at distance `at` along the path (clamped to its ends). */
export function pointAt(path: RoutePath, at: number): Vec {
  const { xs, ys, s, count } = path;
  if (count === 0) return { x: 0, y: 0 };
  if (at <= 0) return { x: xs[0], y: ys[0] };
  if (at >= path.lengthIn) return { x: xs[count - 1], y: ys[count - 1] };
  let lo = 0;
  let hi = count - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (s[mid] <= at) lo = mid;
    else hi = mid;
  }
  const span = s[hi] - s[lo];
  const t = span === 0 ? 0 : (at - s[lo]) / span;
  return { x: xs[lo] + (xs[hi] - xs[lo]) * t, y: ys[lo] + (ys[hi] - ys[lo]) * t };
}

/** Distance along the path of the path point nearest to p (for dropping a support by clicking). */
export function distanceAlong(path: RoutePath, p: Vec): number {
  const { xs, ys, s, count } = path;
  let best = Infinity;
  let bestS = 0;
  for (let i = 0; i < count - 1; i++) {
    const abx = xs[i + 1] - xs[i];
    const aby = ys[i + 1] - ys[i];
    const lenSq = abx * abx + aby * aby;
    const t = lenSq === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - xs[i]) * abx + (p.y - ys[i]) * aby) / lenSq));
    const d = norm(p.x - (xs[i] + abx * t), p.y - (ys[i] + aby * t));
    if (d < best) {
      best = d;
      bestS = s[i] + t * (s[i + 1] - s[i]);
    }
  }
  return bestS;
}

/** Bounding box of the path's vertices. */
export function pathBounds(path: RoutePath): { minX: number; minY: number; maxX: number; maxY: number } {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (let i = 0; i < path.count; i++) {
    if (path.xs[i] < minX) minX = path.xs[i];
    if (path.xs[i] > maxX) maxX = path.xs[i];
    if (path.ys[i] < minY) minY = path.ys[i];
    if (path.ys[i] > maxY) maxY = path.ys[i];
  }
  return { minX, minY, maxX, maxY };
}
