import type { Vec } from './vec.js';
import { add, cross, lerp, normalize, scale, sub } from './vec.js';
import type { CentrelineDetail } from './centreline.js';

/** Largest angle one chord of a bend may span when a bend is drawn as straight pieces. */
const MAX_CHORD_RAD = Math.PI / 12;

/**
 * The route as a polyline whose vertices carry their true distance along the centreline (`s`):
 * straight legs between tangent points, and each bend as short chords. Positions along a line
 * (supports, sleeves, heat intervals) are all measured in this `s`.
 */
export interface RoutePath {
  points: Vec[];
  s: number[];
  lengthIn: number;
}

/** Builds the path of a centreline. A route whose bends do not fit is walked through its sharp corners. */
export function routePath(detail: CentrelineDetail): RoutePath {
  const { points: corners, bends } = detail;
  if (corners.length === 0) return { points: [], s: [], lengthIn: 0 };
  const points: Vec[] = [corners[0]];
  const s: number[] = [0];
  const push = (p: Vec, ds: number) => {
    points.push(p);
    s.push(s[s.length - 1] + ds);
  };
  let cursor = corners[0];
  const lineTo = (p: Vec) => {
    const d = Math.hypot(p.x - cursor.x, p.y - cursor.y);
    if (d > 1e-12) push(p, d);
    cursor = p;
  };
  for (let i = 1; i < corners.length; i++) {
    const bend = detail.fits ? bends[i - 1] : undefined;
    if (i === corners.length - 1 || !bend || bend.tangentIn === 0) {
      lineTo(corners[i]);
      continue;
    }
    const corner = corners[i];
    const inDir = normalize(sub(corner, corners[i - 1]));
    const outDir = normalize(sub(corners[i + 1], corner));
    const start = sub(corner, scale(inDir, bend.tangentIn));
    lineTo(start);
    const turn = Math.sign(cross(inDir, outDir));
    const centre = add(start, scale({ x: -inDir.y * turn, y: inDir.x * turn }, bend.radiusIn));
    const a0 = Math.atan2(start.y - centre.y, start.x - centre.x);
    const pieces = Math.max(1, Math.ceil(bend.deflectionRad / MAX_CHORD_RAD));
    for (let k = 1; k <= pieces; k++) {
      const a = a0 + (turn * bend.deflectionRad * k) / pieces;
      const p = { x: centre.x + bend.radiusIn * Math.cos(a), y: centre.y + bend.radiusIn * Math.sin(a) };
      push(p, bend.arcIn / pieces);
      cursor = p;
    }
  }
  return { points, s, lengthIn: s[s.length - 1] };
}

/** Point at distance `at` along the path (clamped to its ends). */
export function pointAt(path: RoutePath, at: number): Vec {
  const { points, s } = path;
  if (points.length === 0) return { x: 0, y: 0 };
  if (at <= 0) return points[0];
  if (at >= path.lengthIn) return points[points.length - 1];
  let lo = 0;
  let hi = s.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (s[mid] <= at) lo = mid;
    else hi = mid;
  }
  const span = s[hi] - s[lo];
  return span === 0 ? points[lo] : lerp(points[lo], points[hi], (at - s[lo]) / span);
}

/** Distance along the path of the path point nearest to p (for dropping a support by clicking). */
export function distanceAlong(path: RoutePath, p: Vec): number {
  let best = Infinity;
  let bestS = 0;
  for (let i = 0; i < path.points.length - 1; i++) {
    const a = path.points[i];
    const b = path.points[i + 1];
    const ab = sub(b, a);
    const lenSq = ab.x * ab.x + ab.y * ab.y;
    const t = lenSq === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * ab.x + (p.y - a.y) * ab.y) / lenSq));
    const q = lerp(a, b, t);
    const d = Math.hypot(p.x - q.x, p.y - q.y);
    if (d < best) {
      best = d;
      bestS = path.s[i] + t * (path.s[i + 1] - path.s[i]);
    }
  }
  return bestS;
}
