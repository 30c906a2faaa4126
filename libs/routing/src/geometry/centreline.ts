import type { Vec } from './vec.js';

const SAME_POINT = 1e-9;
const TOLERANCE = 1e-9;

export interface Bend {
  /** Index of the corner in the caller's point list. */
  pointIndex: number;
  deflectionRad: number;
  radiusIn: number;
  /** Tangent length R·tan(θ/2): how far the arc starts before, and ends after, the corner. */
  tangentIn: number;
  arcIn: number;
}

export interface CentrelineDetail {
  lengthIn: number;
  fits: boolean;
  /** The route without repeated points: corners, and their original indices. */
  points: Vec[];
  pointIndices: number[];
  /** One per corner of `points` (first and last point have none). */
  bends: Bend[];
  /** Straight leg lengths between consecutive `points`. */
  legsIn: number[];
  /** Legs whose two tangents overlap, by index into `legsIn`. */
  overlappingLegs: number[];
}

/**
 * Length of a route bent around radiused corners. For corner i with deflection θᵢ and radius Rᵢ
 * the tangent is tᵢ = Rᵢ·tan(θᵢ/2) and the arc Rᵢ·θᵢ: length = Σ legs − Σ 2tᵢ + Σ Rᵢθᵢ (DOMAIN §4).
 * A leg shorter than the tangents of its two ends cannot hold both bends: `fits` is false.
 * Repeated points are merged (keeping the larger radius); straight-through points add nothing.
 * A full turn-back (θ = π) with a radius cannot be bent at all: it does not fit and counts as sharp.
 * When the bends do not fit, `lengthIn` is the sharp-cornered length (an upper bound).
 */
export function centrelineDetail(pointsIn: readonly Vec[], bendRadiiIn: readonly number[]): CentrelineDetail {
  // Written with plain loops, locals and distances written out (a call V8 does not inline boxes
  // the number it returns): a large circuit runs this over thousands of corners per evaluation.
  const points: Vec[] = [];
  const pointIndices: number[] = [];
  const radii: number[] = [];
  for (let i = 0; i < pointsIn.length; i++) {
    const p = pointsIn[i];
    const r = Math.max(0, bendRadiiIn[i] ?? 0);
    const last = points.length - 1;
    const gx = last >= 0 ? points[last].x - p.x : 0;
    const gy = last >= 0 ? points[last].y - p.y : 0;
    if (last >= 0 && Math.sqrt(gx * gx + gy * gy) < SAME_POINT) {
      if (r > radii[last]) radii[last] = r;
      continue;
    }
    points.push(p);
    pointIndices.push(i);
    radii.push(r);
  }
  const n = points.length;
  const legsIn = new Array<number>(Math.max(0, n - 1)).fill(0);
  let sharpIn = 0;
  for (let i = 0; i < n - 1; i++) {
    const dx = points[i + 1].x - points[i].x;
    const dy = points[i + 1].y - points[i].y;
    const leg = Math.sqrt(dx * dx + dy * dy);
    legsIn[i] = leg;
    sharpIn += leg;
  }
  const bends: Bend[] = new Array<Bend>(Math.max(0, n - 2)); // sized once: one per inner corner
  // Plain arrays, not Float64Array: creating a typed array costs more than these few numbers.
  const tangentAt: number[] = [0];
  let fits = true;
  let bendSavingIn = 0;
  for (let i = 1; i < n - 1; i++) {
    const prev = points[i - 1];
    const here = points[i];
    const next = points[i + 1];
    const ix = here.x - prev.x;
    const iy = here.y - prev.y;
    const ox = next.x - here.x;
    const oy = next.y - here.y;
    const theta = Math.atan2(Math.abs(ix * oy - iy * ox), ix * ox + iy * oy);
    const radius = radii[i];
    let tangent = radius * Math.tan(theta / 2);
    let arc = radius * theta;
    if (!Number.isFinite(tangent) || theta > Math.PI - 1e-9) {
      if (radius > 0) fits = false;
      tangent = 0;
      arc = 0;
    }
    tangentAt.push(tangent);
    bendSavingIn += 2 * tangent - arc;
    bends[i - 1] = { pointIndex: pointIndices[i], deflectionRad: theta, radiusIn: radius, tangentIn: tangent, arcIn: arc };
  }
  tangentAt.push(0);
  const overlappingLegs: number[] = [];
  for (let i = 0; i < legsIn.length; i++) {
    if (tangentAt[i] + tangentAt[i + 1] > legsIn[i] + TOLERANCE) overlappingLegs.push(i);
  }
  if (overlappingLegs.length > 0) fits = false;
  // Bends that do not fit have no true length; the sharp-cornered route bounds it from above (cut long).
  const lengthIn = fits ? sharpIn - bendSavingIn : sharpIn;
  return { lengthIn, fits, points, pointIndices, bends, legsIn, overlappingLegs };
}

/** Public form (DOMAIN §7): `bendRadiiIn[i]` is the radius at point i; first and last are ignored; 0 is sharp. */
export function centrelineLength(
  pointsIn: ReadonlyArray<{ x: number; y: number }>,
  bendRadiiIn: readonly number[],
): { lengthIn: number; fits: boolean } {
  const { lengthIn, fits } = centrelineDetail(pointsIn, bendRadiiIn);
  return { lengthIn, fits };
}
