import { pointSegmentDistance } from './segment.js';

/**
 * Polygon tests on flat coordinate arrays, for the heat check's inner loop: the same arithmetic,
 * in the same order, as `pointInPolygon` and `segmentInsidePolygon` (polygon.ts), so the answers
 * are identical to the last bit, but with no objects or arrays created per chord. A polygon is
 * `xs[0..n)`, `ys[0..n)`; a chord is the four numbers in `chord` ([ax, ay, bx, by]).
 */

const EPS = 1e-12;
const TOL = 1e-9;

/** Even-odd rule, as pointInPolygon. */
export function pointInPolygonFlat(px: number, py: number, xs: Float64Array, ys: Float64Array, n: number): boolean {
  let inside = false;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const ax = xs[i];
    const ay = ys[i];
    const bx = xs[j];
    const by = ys[j];
    if (ay > py !== by > py && px < ((bx - ax) * (py - ay)) / (by - ay) + ax) inside = !inside;
  }
  return inside;
}

/** Grows a scratch array when a polygon has more crossings than it holds. */
function room(buffer: Float64Array, needed: number): Float64Array {
  if (needed <= buffer.length) return buffer;
  const grown = new Float64Array(Math.max(needed, buffer.length * 2));
  grown.set(buffer);
  return grown;
}

/** Crossing parameters along the chord, then the cut points; reused by every call. */
let hits: Float64Array = new Float64Array(64);
let cuts: Float64Array = new Float64Array(66);

/**
 * segmentInsidePolygon on flat arrays: writes the merged parameter intervals of the chord (0…1)
 * inside the polygon into `out` as start, end pairs and returns how many intervals there are.
 * `out` must hold 2 × (n + 1) numbers.
 */
export function chordInsidePolygon(chord: Float64Array, xs: Float64Array, ys: Float64Array, n: number, out: Float64Array): number {
  const ax = chord[0];
  const ay = chord[1];
  const bx = chord[2];
  const by = chord[3];
  const rx = bx - ax;
  const ry = by - ay;
  let count = 0;
  hits = room(hits, 2 * n);
  for (let i = 0; i < n; i++) {
    // segmentIntersectionParams(a, b, polygon[i], polygon[i + 1]) written out.
    const k = i + 1 === n ? 0 : i + 1;
    const cx = xs[i];
    const cy = ys[i];
    const dx = xs[k];
    const dy = ys[k];
    const sx = dx - cx;
    const sy = dy - cy;
    const denom = rx * sy - ry * sx;
    const acx = cx - ax;
    const acy = cy - ay;
    if (Math.abs(denom) < EPS) {
      if (Math.abs(acx * ry - acy * rx) > EPS) continue; // parallel, apart
      const rr = rx * rx + ry * ry;
      if (rr < EPS) {
        if (pointSegmentDistance({ x: ax, y: ay }, { x: cx, y: cy }, { x: dx, y: dy }) < 1e-9) hits[count++] = 0;
        continue;
      }
      const t0 = (acx * rx + acy * ry) / rr;
      const t1 = ((dx - ax) * rx + (dy - ay) * ry) / rr;
      const lo = Math.max(0, Math.min(t0, t1));
      const hi = Math.min(1, Math.max(t0, t1));
      if (lo <= hi) {
        hits[count++] = lo;
        hits[count++] = hi;
      }
      continue;
    }
    const t = (acx * sy - acy * sx) / denom;
    const u = (acx * ry - acy * rx) / denom;
    if (t >= -TOL && t <= 1 + TOL && u >= -TOL && u <= 1 + TOL) hits[count++] = Math.max(0, Math.min(1, t));
  }
  if (count === 0) {
    if (!pointInPolygonFlat(ax, ay, xs, ys, n)) return 0;
    out[0] = 0;
    out[1] = 1;
    return 1;
  }
  cuts = room(cuts, count + 2);
  cuts[0] = 0;
  cuts[1] = 1;
  for (let k = 0; k < count; k++) cuts[k + 2] = hits[k];
  const cutCount = count + 2;
  cuts.subarray(0, cutCount).sort(); // numeric order; crossings are never NaN or −0
  // The inside stretches between cuts, merged as mergeIntervals merges them (touching ones join).
  let found = 0;
  for (let k = 0; k < cutCount - 1; k++) {
    const s = cuts[k];
    const e = cuts[k + 1];
    if (e - s < 1e-12) continue;
    const t = (s + e) / 2;
    if (!pointInPolygonFlat(ax + (bx - ax) * t, ay + (by - ay) * t, xs, ys, n)) continue;
    if (found > 0 && s <= out[2 * found - 1]) {
      if (e > out[2 * found - 1]) out[2 * found - 1] = e;
    } else {
      out[2 * found] = s;
      out[2 * found + 1] = e;
      found++;
    }
  }
  if (found === 0) {
    // A touch at a single point (a corner grazing an edge) still counts as contact.
    out[0] = hits[0];
    out[1] = hits[0];
    return 1;
  }
  return found;
}
