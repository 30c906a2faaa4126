import type { Vec } from './vec.js';
import { cross, distance, dot, sub } from './vec.js';

const EPS = 1e-12;

/** Shortest distance from point p to segment ab (a zero-length segment is a point). */
export function pointSegmentDistance(p: Vec, a: Vec, b: Vec): number {
  const ab = sub(b, a);
  const lenSq = dot(ab, ab);
  if (lenSq < EPS) return distance(p, a);
  const t = Math.max(0, Math.min(1, dot(sub(p, a), ab) / lenSq));
  return Math.hypot(a.x + ab.x * t - p.x, a.y + ab.y * t - p.y);
}

/**
 * Where segment ab crosses or touches segment cd: the parameters along ab (0…1) of the
 * crossing, or of the overlap's ends when the two are collinear; empty when apart.
 */
export function segmentIntersectionParams(a: Vec, b: Vec, c: Vec, d: Vec): number[] {
  const r = sub(b, a);
  const s = sub(d, c);
  const denom = cross(r, s);
  const ac = sub(c, a);
  if (Math.abs(denom) < EPS) {
    if (Math.abs(cross(ac, r)) > EPS) return []; // parallel, apart
    const rr = dot(r, r);
    if (rr < EPS) return pointSegmentDistance(a, c, d) < 1e-9 ? [0] : [];
    const t0 = dot(ac, r) / rr;
    const t1 = dot(sub(d, a), r) / rr;
    const lo = Math.max(0, Math.min(t0, t1));
    const hi = Math.min(1, Math.max(t0, t1));
    return lo <= hi ? [lo, hi] : [];
  }
  const t = cross(ac, s) / denom;
  const u = cross(ac, r) / denom;
  const tol = 1e-9;
  return t >= -tol && t <= 1 + tol && u >= -tol && u <= 1 + tol ? [Math.max(0, Math.min(1, t))] : [];
}

export function segmentsIntersect(a: Vec, b: Vec, c: Vec, d: Vec): boolean {
  return segmentIntersectionParams(a, b, c, d).length > 0;
}

/** Shortest distance between segments ab and cd. */
export function segmentSegmentDistance(a: Vec, b: Vec, c: Vec, d: Vec): number {
  if (segmentsIntersect(a, b, c, d)) return 0;
  return Math.min(
    pointSegmentDistance(a, c, d),
    pointSegmentDistance(b, c, d),
    pointSegmentDistance(c, a, b),
    pointSegmentDistance(d, a, b),
  );
}

/**
 * The parameter interval of segment ab (0…1) lying within `radius` of segment ef, i.e. inside
 * the capsule around ef. The capsule is convex, so the answer is one interval or none.
 */
export function segmentWithinCapsule(a: Vec, b: Vec, e: Vec, f: Vec, radius: number): [number, number] | null {
  const d = sub(b, a);
  let lo = Infinity;
  let hi = -Infinity;
  const take = (range: [number, number] | null) => {
    if (!range) return;
    lo = Math.min(lo, range[0]);
    hi = Math.max(hi, range[1]);
  };
  take(segmentWithinDisc(a, d, e, radius));
  take(segmentWithinDisc(a, d, f, radius));
  take(segmentWithinSlab(a, d, e, f, radius));
  lo = Math.max(0, lo);
  hi = Math.min(1, hi);
  return lo <= hi ? [lo, hi] : null;
}

/** Parameters t where |a + t·d − centre| ≤ radius (unclipped). */
function segmentWithinDisc(a: Vec, d: Vec, centre: Vec, radius: number): [number, number] | null {
  const m = sub(a, centre);
  const qa = dot(d, d);
  const qb = 2 * dot(m, d);
  const qc = dot(m, m) - radius * radius;
  if (qa < EPS) return qc <= 0 ? [0, 1] : null;
  const disc = qb * qb - 4 * qa * qc;
  if (disc < 0) return null;
  const root = Math.sqrt(disc);
  return [(-qb - root) / (2 * qa), (-qb + root) / (2 * qa)];
}

/** Parameters t where a + t·d projects onto ef and lies within `radius` of its line (unclipped). */
function segmentWithinSlab(a: Vec, d: Vec, e: Vec, f: Vec, radius: number): [number, number] | null {
  const ef = sub(f, e);
  const len = Math.hypot(ef.x, ef.y);
  if (len < EPS) return null;
  const ux = ef.x / len;
  const uy = ef.y / len;
  const m = sub(a, e);
  let lo = -Infinity;
  let hi = Infinity;
  // Clip against lo ≤ v0 + t·dv ≤ hi for each of the two axes of the edge's frame.
  const clip = (v0: number, dv: number, min: number, max: number): boolean => {
    if (Math.abs(dv) < EPS) return v0 >= min && v0 <= max;
    let t0 = (min - v0) / dv;
    let t1 = (max - v0) / dv;
    if (t0 > t1) [t0, t1] = [t1, t0];
    lo = Math.max(lo, t0);
    hi = Math.min(hi, t1);
    return lo <= hi;
  };
  const along0 = m.x * ux + m.y * uy;
  const alongD = d.x * ux + d.y * uy;
  const across0 = -m.x * uy + m.y * ux;
  const acrossD = -d.x * uy + d.y * ux;
  if (!clip(along0, alongD, 0, len)) return null;
  if (!clip(across0, acrossD, -radius, radius)) return null;
  return [lo, hi];
}
