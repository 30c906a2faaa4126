import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { centrelineDetail, centrelineLength } from './centreline.js';
import { pointAt, routePath, distanceAlong } from './route-path.js';

/** A leg of `a` in, a turn of `deg` degrees, and a leg of `b` out. */
function turn(a: number, b: number, deg: number) {
  const r = (deg * Math.PI) / 180;
  return [
    { x: 0, y: 0 },
    { x: a, y: 0 },
    { x: a + b * Math.cos(r), y: b * Math.sin(r) },
  ];
}

describe('centrelineLength', () => {
  it('DOMAIN.md worked check: two 10 in legs at 90° with R = 2 in give 20 − 4 + π = 19.1416 in', () => {
    const { lengthIn, fits } = centrelineLength(turn(10, 10, 90), [0, 2, 0]);
    expect(lengthIn).toBeCloseTo(20 - 4 + Math.PI, 10);
    expect(lengthIn).toBeCloseTo(19.1416, 4);
    expect(fits).toBe(true);
  });

  // Hose makers' bend-length formula: a bend of A degrees on radius B uses L = A·2πB/360 of hose.
  it.each([15, 30, 45, 60, 90, 120, 135, 150])('the arc of a %d° bend is A·2πB/360 (hose makers’ bend-length formula)', (deg) => {
    const radius = 3;
    const detail = centrelineDetail(turn(50, 50, deg), [0, radius, 0]);
    const bendLength = (deg * 2 * Math.PI * radius) / 360;
    expect(detail.bends[0].arcIn).toBeCloseTo(bendLength, 10);
    const tangent = radius * Math.tan((deg * Math.PI) / 360);
    expect(detail.lengthIn).toBeCloseTo(100 - 2 * tangent + bendLength, 10);
  });

  it('a sharp corner (R = 0) adds nothing and takes nothing', () => {
    expect(centrelineLength(turn(10, 10, 90), [0, 0, 0]).lengthIn).toBeCloseTo(20, 12);
  });

  it('ignores the radii given at the two ends', () => {
    expect(centrelineLength(turn(10, 10, 90), [5, 2, 5]).lengthIn).toBeCloseTo(19.1416, 4);
  });

  it('handles repeated points and straight-through points', () => {
    const points = [
      { x: 0, y: 0 },
      { x: 0, y: 0 },
      { x: 5, y: 0 },
      { x: 10, y: 0 },
      { x: 10, y: 0 },
      { x: 10, y: 10 },
    ];
    const { lengthIn, fits } = centrelineLength(points, [0, 0, 3, 0, 2, 0]);
    expect(fits).toBe(true);
    expect(lengthIn).toBeCloseTo(20 - 4 + Math.PI, 10); // the repeated corner keeps its 2 in radius
    expect(centrelineLength([{ x: 1, y: 1 }], [0]).lengthIn).toBe(0);
    expect(centrelineLength([], []).lengthIn).toBe(0);
  });

  it('does not fit when two bends’ tangents overlap on the leg between them, counting both ends', () => {
    // Two 90° bends of R = 2 need 2 + 2 = 4 in of leg between them.
    const zigzag = (leg: number) => [
      { x: 0, y: 0 },
      { x: 10, y: 0 },
      { x: 10, y: leg },
      { x: 20, y: leg },
    ];
    expect(centrelineLength(zigzag(4), [0, 2, 2, 0]).fits).toBe(true);
    expect(centrelineLength(zigzag(3.9), [0, 2, 2, 0]).fits).toBe(false);
    expect(centrelineLength(zigzag(3.9), [0, 2, 2, 0]).lengthIn).toBeCloseTo(23.9, 12); // falls back to the sharp route
    expect(centrelineLength(zigzag(3.9), [0, 2, 1.9, 0]).fits).toBe(true);
    // A first leg shorter than the tangent of its single bend does not fit either.
    expect(centrelineLength(turn(1.9, 10, 90), [0, 2, 0]).fits).toBe(false);
  });

  it('a turn back on itself with a radius does not fit', () => {
    const back = [
      { x: 0, y: 0 },
      { x: 10, y: 0 },
      { x: 0, y: 0 },
    ];
    const result = centrelineLength(back, [0, 1, 0]);
    expect(result.fits).toBe(false);
    expect(Number.isFinite(result.lengthIn)).toBe(true);
  });

  it('never exceeds the sharp polyline and never falls below the straight chord (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ x: fc.double({ min: -100, max: 100, noNaN: true }), y: fc.double({ min: -100, max: 100, noNaN: true }) }), {
          minLength: 2,
          maxLength: 8,
        }),
        fc.array(fc.double({ min: 0, max: 3, noNaN: true }), { minLength: 8, maxLength: 8 }),
        (points, radii) => {
          const detail = centrelineDetail(points, radii);
          const sharp = detail.legsIn.reduce((s, l) => s + l, 0);
          fc.pre(detail.fits);
          expect(detail.lengthIn).toBeLessThanOrEqual(sharp + 1e-9);
          const first = points[0];
          const last = points[points.length - 1];
          expect(detail.lengthIn).toBeGreaterThanOrEqual(Math.hypot(last.x - first.x, last.y - first.y) - 1e-9);
        },
      ),
    );
  });
});

describe('routePath', () => {
  it('walks the bent route with its true length and its tangent points', () => {
    const detail = centrelineDetail(turn(10, 10, 90), [0, 2, 0]);
    const path = routePath(detail);
    expect(path.lengthIn).toBeCloseTo(detail.lengthIn, 10);
    expect(pointAt(path, 8).x).toBeCloseTo(8, 10); // the arc starts at 10 − t = 8 in
    expect(pointAt(path, 8).y).toBeCloseTo(0, 10);
    const arcEnd = pointAt(path, 8 + Math.PI);
    expect(arcEnd.x).toBeCloseTo(10, 10);
    expect(arcEnd.y).toBeCloseTo(2, 10);
    expect(pointAt(path, 1e9)).toEqual({ x: 10, y: 10 });
    expect(distanceAlong(path, { x: 11, y: 5 })).toBeCloseTo(8 + Math.PI + 3, 10);
  });
});
