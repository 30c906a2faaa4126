import type { Bend, CentrelineDetail } from './centreline.js';
import type { RoutePath } from './route-path.js';
import type { Vec } from './vec.js';

/**
 * The engine's own form of `centrelineDetail` (centreline.ts): the route comes in as flat arrays
 * and the corners go into one Float64Array, so a line's centreline is two allocations instead of
 * a few dozen objects. The arithmetic is the same, step for step, as `centrelineDetail` and
 * `fillRoutePath`, so lengths and paths are identical to the last bit (centreline-packed.test.ts);
 * `points`, `bends`, `legsIn` … are built on first read, for the rules that read them.
 */

const SAME_POINT = 1e-9;
const TOLERANCE = 1e-9;
const MAX_CHORD_RAD = Math.PI / 12;
/** Numbers kept per corner: x, y, radius, original index, deflection, tangent, arc. */
const STRIDE = 7;

/** Scratch for the merged corners, reused by every call. */
let merged: Float64Array = new Float64Array(STRIDE * 64);

export class PackedCentreline implements CentrelineDetail {
  private cachedPoints: Vec[] | undefined;
  private cachedBends: Bend[] | undefined;
  private cachedLegs: number[] | undefined;
  private cachedOverlaps: number[] | undefined;

  constructor(
    /** STRIDE numbers per corner. */
    readonly data: Float64Array,
    readonly count: number,
    readonly lengthIn: number,
    readonly fits: boolean,
  ) {}

  get points(): Vec[] {
    if (!this.cachedPoints) {
      const points: Vec[] = [];
      for (let i = 0; i < this.count; i++) points.push({ x: this.data[STRIDE * i], y: this.data[STRIDE * i + 1] });
      this.cachedPoints = points;
    }
    return this.cachedPoints;
  }

  get pointIndices(): number[] {
    const indices: number[] = [];
    for (let i = 0; i < this.count; i++) indices.push(this.data[STRIDE * i + 3]);
    return indices;
  }

  get bends(): Bend[] {
    if (!this.cachedBends) {
      const bends: Bend[] = [];
      for (let i = 1; i < this.count - 1; i++) {
        const k = STRIDE * i;
        const d = this.data;
        bends.push({ pointIndex: d[k + 3], deflectionRad: d[k + 4], radiusIn: d[k + 2], tangentIn: d[k + 5], arcIn: d[k + 6] });
      }
      this.cachedBends = bends;
    }
    return this.cachedBends;
  }

  get legsIn(): number[] {
    if (!this.cachedLegs) {
      const legs: number[] = [];
      const d = this.data;
      for (let i = 0; i < this.count - 1; i++) {
        const dx = d[STRIDE * (i + 1)] - d[STRIDE * i];
        const dy = d[STRIDE * (i + 1) + 1] - d[STRIDE * i + 1];
        legs.push(Math.sqrt(dx * dx + dy * dy));
      }
      this.cachedLegs = legs;
    }
    return this.cachedLegs;
  }

  get overlappingLegs(): number[] {
    if (!this.cachedOverlaps) {
      const legs = this.legsIn;
      const d = this.data;
      const overlaps: number[] = [];
      for (let i = 0; i < legs.length; i++) {
        const before = i === 0 ? 0 : d[STRIDE * i + 5];
        const after = i + 1 === this.count - 1 ? 0 : d[STRIDE * (i + 1) + 5];
        if (before + after > legs[i] + TOLERANCE) overlaps.push(i);
      }
      this.cachedOverlaps = overlaps;
    }
    return this.cachedOverlaps;
  }

  /** Plain data, as `centrelineDetail` returns it (for tests and logs). */
  toJSON(): Omit<CentrelineDetail, never> {
    const { lengthIn, fits, points, pointIndices, bends, legsIn, overlappingLegs } = this;
    return { lengthIn, fits, points, pointIndices, bends, legsIn, overlappingLegs };
  }
}

/**
 * centrelineDetail over `n` route points in flat arrays (inches): repeated points merged (keeping
 * the larger radius), tangents R·tan(θ/2), arcs R·θ, and whether the bends fit (DOMAIN §4).
 */
export function packCentreline(xs: ArrayLike<number>, ys: ArrayLike<number>, radii: ArrayLike<number>, n: number): PackedCentreline {
  if (merged.length < STRIDE * n) merged = new Float64Array(STRIDE * Math.max(n, 2 * (merged.length / STRIDE)));
  const d = merged;
  let m = 0;
  for (let i = 0; i < n; i++) {
    const x = xs[i];
    const y = ys[i];
    const r = Math.max(0, radii[i] ?? 0);
    if (m > 0) {
      const gx = d[STRIDE * (m - 1)] - x;
      const gy = d[STRIDE * (m - 1) + 1] - y;
      if (Math.sqrt(gx * gx + gy * gy) < SAME_POINT) {
        if (r > d[STRIDE * (m - 1) + 2]) d[STRIDE * (m - 1) + 2] = r;
        continue;
      }
    }
    const k = STRIDE * m;
    d[k] = x;
    d[k + 1] = y;
    d[k + 2] = r;
    d[k + 3] = i;
    d[k + 4] = 0;
    d[k + 5] = 0;
    d[k + 6] = 0;
    m++;
  }
  let sharpIn = 0;
  for (let i = 0; i < m - 1; i++) {
    const dx = d[STRIDE * (i + 1)] - d[STRIDE * i];
    const dy = d[STRIDE * (i + 1) + 1] - d[STRIDE * i + 1];
    sharpIn += Math.sqrt(dx * dx + dy * dy);
  }
  let fits = true;
  let bendSavingIn = 0;
  for (let i = 1; i < m - 1; i++) {
    const p = STRIDE * (i - 1);
    const h = STRIDE * i;
    const q = STRIDE * (i + 1);
    const ix = d[h] - d[p];
    const iy = d[h + 1] - d[p + 1];
    const ox = d[q] - d[h];
    const oy = d[q + 1] - d[h + 1];
    const theta = Math.atan2(Math.abs(ix * oy - iy * ox), ix * ox + iy * oy);
    const radius = d[h + 2];
    let tangent = radius * Math.tan(theta / 2);
    let arc = radius * theta;
    if (!Number.isFinite(tangent) || theta > Math.PI - 1e-9) {
      if (radius > 0) fits = false;
      tangent = 0;
      arc = 0;
    }
    bendSavingIn += 2 * tangent - arc;
    d[h + 4] = theta;
    d[h + 5] = tangent;
    d[h + 6] = arc;
  }
  for (let i = 0; i < m - 1 && fits; i++) {
    const dx = d[STRIDE * (i + 1)] - d[STRIDE * i];
    const dy = d[STRIDE * (i + 1) + 1] - d[STRIDE * i + 1];
    const leg = Math.sqrt(dx * dx + dy * dy);
    const before = i === 0 ? 0 : d[STRIDE * i + 5];
    const after = i + 1 === m - 1 ? 0 : d[STRIDE * (i + 1) + 5];
    if (before + after > leg + TOLERANCE) fits = false;
  }
  const lengthIn = fits ? sharpIn - bendSavingIn : sharpIn;
  return new PackedCentreline(d.slice(0, STRIDE * m), m, lengthIn, fits);
}

/** fillRoutePath (route-path.ts) for a packed centreline: the same path, written into `path`. */
export function fillPackedRoutePath(c: PackedCentreline, path: RoutePath): RoutePath {
  const { xs, ys, s } = path;
  const d = c.data;
  const n = c.count;
  path.count = 0;
  path.lengthIn = 0;
  if (n === 0) return path;
  xs[0] = d[0];
  ys[0] = d[1];
  s[0] = 0;
  let count = 1;
  for (let i = 1; i < n; i++) {
    const h = STRIDE * i;
    const p = STRIDE * (i - 1);
    const hasBend = c.fits && i < n - 1;
    const tangentIn = hasBend ? d[h + 5] : 0;
    const straight = !hasBend || tangentIn === 0;
    const cornerX = d[h];
    const cornerY = d[h + 1];
    const prevX = d[p];
    const prevY = d[p + 1];
    const inLen = Math.sqrt((cornerX - prevX) * (cornerX - prevX) + (cornerY - prevY) * (cornerY - prevY));
    const ix = (cornerX - prevX) / inLen;
    const iy = (cornerY - prevY) / inLen;
    const toX = straight ? cornerX : cornerX - ix * tangentIn;
    const toY = straight ? cornerY : cornerY - iy * tangentIn;
    const last = count - 1;
    const run = Math.sqrt((toX - xs[last]) * (toX - xs[last]) + (toY - ys[last]) * (toY - ys[last]));
    if (run > 1e-12) {
      xs[count] = toX;
      ys[count] = toY;
      s[count] = s[last] + run;
      count++;
    }
    if (straight) continue;
    const q = STRIDE * (i + 1);
    const nextX = d[q];
    const nextY = d[q + 1];
    const outLen = Math.sqrt((nextX - cornerX) * (nextX - cornerX) + (nextY - cornerY) * (nextY - cornerY));
    const ox = (nextX - cornerX) / outLen;
    const oy = (nextY - cornerY) / outLen;
    const turn = Math.sign(ix * oy - iy * ox);
    const radiusIn = d[h + 2];
    const deflectionRad = d[h + 4];
    const arcIn = d[h + 6];
    const cx = toX - iy * turn * radiusIn;
    const cy = toY + ix * turn * radiusIn;
    const a0 = Math.atan2(toY - cy, toX - cx);
    const pieces = Math.max(1, Math.ceil(deflectionRad / MAX_CHORD_RAD));
    for (let k = 1; k <= pieces; k++) {
      const a = a0 + (turn * deflectionRad * k) / pieces;
      xs[count] = cx + radiusIn * Math.cos(a);
      ys[count] = cy + radiusIn * Math.sin(a);
      s[count] = s[count - 1] + arcIn / pieces;
      count++;
    }
  }
  path.count = count;
  path.lengthIn = s[count - 1];
  return path;
}
