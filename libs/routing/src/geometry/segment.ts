import type { Vec } from './vec.js';
import { cross, distance, dot, norm, sub } from './vec.js';

const EPS = 1e-12;

/** Shortest distance from point p to segment ab (a zero-length segment is a point). */
export function pointSegmentDistance(p: Vec, a: Vec, b: Vec): number {
  const ab = sub(b, a);
  const lenSq = dot(ab, ab);
  if (lenSq < EPS) return distance(p, a);
  const t = Math.max(0, Math.min(1, dot(sub(p, a), ab) / lenSq));
  return norm(a.x + ab.x * t - p.x, a.y + ab.y * t - p.y);
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
 * the capsule around ef. The capsule is convex, so the answer is one interval or none: the union
 * of the stretches inside the two end discs and inside the slab along ef.
 */
export function segmentWithinCapsule(a: Vec, b: Vec, e: Vec, f: Vec, radius: number): [number, number] | null {
  const range = new Float64Array(2);
  const found = chordWithinCapsule(Float64Array.of(a.x, a.y, b.x, b.y), Float64Array.of(e.x, e.y, f.x, f.y, radius), range);
  return found ? [range[0], range[1]] : null;
}

/**
 * segmentWithinCapsule on flat arrays: `chord` is [ax, ay, bx, by], `capsule` is [ex, ey, fx, fy,
 * radius] from index `at` (a zone keeps all its edges' capsules in one array); the interval goes
 * into `out` (true when there is one). The heat check runs this on thousands of chords per
 * evaluation: numbers passed one by one would be boxed on every call.
 */
export function chordWithinCapsule(chord: Float64Array, capsule: Float64Array, out: Float64Array, at = 0): boolean {
  const ax = chord[0];
  const ay = chord[1];
  const dx = chord[2] - ax;
  const dy = chord[3] - ay;
  const ex = capsule[at];
  const ey = capsule[at + 1];
  const fx = capsule[at + 2];
  const fy = capsule[at + 3];
  const radius = capsule[at + 4];
  let lo = Infinity;
  let hi = -Infinity;
  // The two end discs: |a + t·d − centre|² ≤ r², a quadratic in t.
  const qa = dx * dx + dy * dy;
  for (let k = 0; k < 2; k++) {
    const mx = ax - (k === 0 ? ex : fx);
    const my = ay - (k === 0 ? ey : fy);
    const qc = mx * mx + my * my - radius * radius;
    if (qa < EPS) {
      if (qc <= 0) {
        lo = Math.min(lo, 0);
        hi = Math.max(hi, 1);
      }
      continue;
    }
    const qb = 2 * (mx * dx + my * dy);
    const disc = qb * qb - 4 * qa * qc;
    if (disc < 0) continue;
    const root = Math.sqrt(disc);
    lo = Math.min(lo, (-qb - root) / (2 * qa));
    hi = Math.max(hi, (-qb + root) / (2 * qa));
  }
  // The slab: 0 ≤ along ≤ |ef| and |across| ≤ r in ef's own frame, both linear in t.
  const len = Math.sqrt((fx - ex) * (fx - ex) + (fy - ey) * (fy - ey));
  if (len >= EPS) {
    const ux = (fx - ex) / len;
    const uy = (fy - ey) / len;
    const mx = ax - ex;
    const my = ay - ey;
    out[0] = -Infinity;
    out[1] = Infinity;
    if (
      clipInto(mx * ux + my * uy, dx * ux + dy * uy, 0, len, out) &&
      clipInto(-mx * uy + my * ux, -dx * uy + dy * ux, -radius, radius, out)
    ) {
      lo = Math.min(lo, out[0]);
      hi = Math.max(hi, out[1]);
    }
  }
  lo = Math.max(0, lo);
  hi = Math.min(1, hi);
  out[0] = lo;
  out[1] = hi;
  return lo <= hi;
}

/** Narrows [out[0], out[1]] to the t where min ≤ v0 + t·dv ≤ max; false when nothing is left. */
function clipInto(v0: number, dv: number, min: number, max: number, out: Float64Array): boolean {
  if (Math.abs(dv) < EPS) return v0 >= min && v0 <= max;
  const t0 = (min - v0) / dv;
  const t1 = (max - v0) / dv;
  const from = Math.max(out[0], Math.min(t0, t1));
  const to = Math.min(out[1], Math.max(t0, t1));
  out[0] = from;
  out[1] = to;
  return from <= to;
}
