import type { Vec } from './vec.js';
import { deflection, distance, sub } from './vec.js';

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
  const points: Vec[] = [];
  const pointIndices: number[] = [];
  const radii: number[] = [];
  pointsIn.forEach((p, i) => {
    const r = Math.max(0, bendRadiiIn[i] ?? 0);
    const last = points.length - 1;
    if (last >= 0 && distance(points[last], p) < SAME_POINT) {
      radii[last] = Math.max(radii[last], r);
      return;
    }
    points.push(p);
    pointIndices.push(i);
    radii.push(r);
  });
  const legsIn = points.slice(1).map((p, i) => distance(points[i], p));
  const bends: Bend[] = [];
  const tangentAt = new Array<number>(points.length).fill(0);
  let fits = true;
  for (let i = 1; i < points.length - 1; i++) {
    const theta = deflection(sub(points[i], points[i - 1]), sub(points[i + 1], points[i]));
    const radius = radii[i];
    let tangent = radius * Math.tan(theta / 2);
    let arc = radius * theta;
    if (!Number.isFinite(tangent) || theta > Math.PI - 1e-9) {
      if (radius > 0) fits = false;
      tangent = 0;
      arc = 0;
    }
    tangentAt[i] = tangent;
    bends.push({ pointIndex: pointIndices[i], deflectionRad: theta, radiusIn: radius, tangentIn: tangent, arcIn: arc });
  }
  const overlappingLegs: number[] = [];
  legsIn.forEach((leg, i) => {
    if (tangentAt[i] + tangentAt[i + 1] > leg + TOLERANCE) overlappingLegs.push(i);
  });
  if (overlappingLegs.length > 0) fits = false;
  const sharpIn = legsIn.reduce((s, l) => s + l, 0);
  // Bends that do not fit have no true length; the sharp-cornered route bounds it from above (cut long).
  const lengthIn = fits ? sharpIn - bends.reduce((s, b) => s + 2 * b.tangentIn - b.arcIn, 0) : sharpIn;
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
