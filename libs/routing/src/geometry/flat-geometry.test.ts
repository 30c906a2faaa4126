import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { centrelineDetail } from './centreline.js';
import { fillPackedRoutePath, packCentreline } from './centreline-packed.js';
import { pointInPolygon, segmentInsidePolygon } from './polygon.js';
import { chordInsidePolygon, pointInPolygonFlat } from './polygon-flat.js';
import { routePath, type RoutePath } from './route-path.js';

// The flat forms are the engine's fast path: they must give exactly (toBe, not toBeCloseTo) what
// the object forms give, which the other geometry tests check against worked values.

const coordinate = fc.double({ min: -500, max: 500, noNaN: true });
const point = fc.record({ x: coordinate, y: coordinate });
/** Routes with repeated points, collinear runs, turn-backs and sharp corners among the radii. */
const route = fc
  .array(fc.tuple(point, fc.oneof(fc.constant(0), fc.double({ min: 0, max: 40, noNaN: true })), fc.nat(9)), { minLength: 0, maxLength: 12 })
  .map((rows) => {
    const points: Array<{ x: number; y: number }> = [];
    const radii: number[] = [];
    for (const [p, r, trick] of rows) {
      const last = points[points.length - 1];
      // Now and then repeat the last point, or continue straight on, or turn right back.
      const q = last && trick === 0 ? { ...last } : last && trick === 1 ? { x: 2 * last.x - (points[points.length - 2]?.x ?? 0), y: 2 * last.y - (points[points.length - 2]?.y ?? 0) } : p;
      points.push(q);
      radii.push(r);
    }
    return { points, radii };
  });

const emptyPath = (): RoutePath => ({ xs: [], ys: [], s: [], count: 0, lengthIn: 0 });

describe('packed centreline', () => {
  it('gives exactly the length, fit, corners, bends and path of centrelineDetail and routePath', () => {
    fc.assert(
      fc.property(route, ({ points, radii }) => {
        const detail = centrelineDetail(points, radii);
        const packed = packCentreline(
          points.map((p) => p.x),
          points.map((p) => p.y),
          radii,
          points.length,
        );
        expect(packed.lengthIn).toBe(detail.lengthIn);
        expect(packed.fits).toBe(detail.fits);
        expect(packed.points).toEqual(detail.points.map((p) => ({ x: p.x, y: p.y })));
        expect(packed.pointIndices).toEqual(detail.pointIndices);
        expect(packed.bends).toEqual(detail.bends);
        expect(packed.legsIn).toEqual(detail.legsIn);
        expect(packed.overlappingLegs).toEqual(detail.overlappingLegs);
        const path = fillPackedRoutePath(packed, emptyPath());
        const reference = routePath(detail);
        expect(path.count).toBe(reference.count);
        expect(path.lengthIn).toBe(reference.lengthIn);
        expect(path.xs.slice(0, path.count)).toEqual(reference.xs);
        expect(path.ys.slice(0, path.count)).toEqual(reference.ys);
        expect(path.s.slice(0, path.count)).toEqual(reference.s);
      }),
      { numRuns: 500 },
    );
  });

  it('merges a repeated corner and keeps the larger radius', () => {
    const packed = packCentreline([0, 10, 10, 10], [0, 0, 0, 10], [0, 1, 3, 0], 4);
    expect(packed.count).toBe(3);
    expect(packed.bends).toEqual([expect.objectContaining({ pointIndex: 1, radiusIn: 3 })]);
  });
});

const small = fc.integer({ min: -20, max: 20 }); // integer grid: touches, shared vertices and collinear edges happen often
const polygon = fc.array(fc.record({ x: small, y: small }), { minLength: 3, maxLength: 9 });

describe('flat polygon tests', () => {
  it('chordInsidePolygon gives exactly the intervals of segmentInsidePolygon, touches included', () => {
    fc.assert(
      fc.property(polygon, fc.record({ x: small, y: small }), fc.record({ x: small, y: small }), (poly, a, b) => {
        const xs = Float64Array.from(poly, (p) => p.x);
        const ys = Float64Array.from(poly, (p) => p.y);
        const out = new Float64Array(2 * (poly.length + 1));
        const count = chordInsidePolygon(Float64Array.of(a.x, a.y, b.x, b.y), xs, ys, poly.length, out);
        const flat = Array.from({ length: count }, (_, k) => ({ start: out[2 * k], end: out[2 * k + 1] }));
        expect(flat).toEqual(segmentInsidePolygon(a, b, poly));
        expect(pointInPolygonFlat(a.x, a.y, xs, ys, poly.length)).toBe(pointInPolygon(a, poly));
      }),
      { numRuns: 2000 },
    );
  });
});
