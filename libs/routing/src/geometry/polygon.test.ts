import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clampIntervals, mergeIntervals, subtractIntervals, totalLength } from './intervals.js';
import { pointInPolygon, pointPolygonDistance, segmentNearPolygon, segmentPolygonDistance } from './polygon.js';
import { pointSegmentDistance, segmentSegmentDistance } from './segment.js';
import { lerp } from './vec.js';

const square = [
  { x: 0, y: 0 },
  { x: 10, y: 0 },
  { x: 10, y: 10 },
  { x: 0, y: 10 },
];
// A concave "U": the notch 4 < x < 6, y > 2 is outside.
const notched = [
  { x: 0, y: 0 },
  { x: 10, y: 0 },
  { x: 10, y: 10 },
  { x: 6, y: 10 },
  { x: 6, y: 2 },
  { x: 4, y: 2 },
  { x: 4, y: 10 },
  { x: 0, y: 10 },
];

describe('points, segments and polygons', () => {
  it('distance from a point to a segment: perpendicular, beyond the ends, and a zero-length segment', () => {
    expect(pointSegmentDistance({ x: 5, y: 3 }, { x: 0, y: 0 }, { x: 10, y: 0 })).toBe(3);
    expect(pointSegmentDistance({ x: 13, y: 4 }, { x: 0, y: 0 }, { x: 10, y: 0 })).toBe(5); // 3-4-5
    expect(pointSegmentDistance({ x: 3, y: 4 }, { x: 0, y: 0 }, { x: 0, y: 0 })).toBe(5);
  });

  it('distance between segments: crossing, parallel and collinear apart', () => {
    expect(segmentSegmentDistance({ x: 0, y: 0 }, { x: 10, y: 10 }, { x: 0, y: 10 }, { x: 10, y: 0 })).toBe(0);
    expect(segmentSegmentDistance({ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 0, y: 2 }, { x: 10, y: 2 })).toBe(2);
    expect(segmentSegmentDistance({ x: 0, y: 0 }, { x: 1, y: 0 }, { x: 4, y: 0 }, { x: 9, y: 0 })).toBe(3);
  });

  it('point in polygon, convex and concave', () => {
    expect(pointInPolygon({ x: 5, y: 5 }, square)).toBe(true);
    expect(pointInPolygon({ x: 15, y: 5 }, square)).toBe(false);
    expect(pointInPolygon({ x: 5, y: 5 }, notched)).toBe(false);
    expect(pointInPolygon({ x: 2, y: 5 }, notched)).toBe(true);
    expect(pointPolygonDistance({ x: 5, y: 5 }, notched)).toBe(1);
    expect(segmentPolygonDistance({ x: 12, y: -5 }, { x: 12, y: 15 }, square)).toBe(2);
    expect(segmentPolygonDistance({ x: 2, y: 2 }, { x: 3, y: 3 }, square)).toBe(0); // wholly inside
  });

  it('stretches of a segment near a polygon match a fine brute-force sampling (property)', () => {
    const coord = fc.double({ min: -20, max: 30, noNaN: true });
    fc.assert(
      fc.property(coord, coord, coord, coord, fc.double({ min: 0, max: 5, noNaN: true }), fc.boolean(), (ax, ay, bx, by, clearance, useNotch) => {
        const a = { x: ax, y: ay };
        const b = { x: bx, y: by };
        fc.pre(Math.hypot(bx - ax, by - ay) > 0.5);
        const polygon = useNotch ? notched : square;
        const intervals = segmentNearPolygon(a, b, polygon, clearance);
        const inside = (t: number) => intervals.some((i) => t >= i.start - 1e-9 && t <= i.end + 1e-9);
        for (let k = 0; k <= 200; k++) {
          const t = k / 200;
          const d = pointPolygonDistance(lerp(a, b, t), polygon);
          if (d < clearance - 1e-6) expect(inside(t)).toBe(true);
          if (d > clearance + 1e-6) expect(inside(t)).toBe(false);
        }
      }),
    );
  });
});

describe('intervals', () => {
  it('merge, clamp, subtract and total', () => {
    const merged = mergeIntervals([
      { start: 5, end: 7 },
      { start: 0, end: 2 },
      { start: 1, end: 3 },
      { start: 3, end: 4 },
    ]);
    expect(merged).toEqual([
      { start: 0, end: 4 },
      { start: 5, end: 7 },
    ]);
    expect(clampIntervals([{ start: -1, end: 2 }, { start: 8, end: 12 }, { start: 20, end: 21 }], 0, 10)).toEqual([
      { start: 0, end: 2 },
      { start: 8, end: 10 },
    ]);
    expect(subtractIntervals([{ start: 0, end: 10 }], [{ start: 2, end: 3 }, { start: 9, end: 12 }])).toEqual([
      { start: 0, end: 2 },
      { start: 3, end: 9 },
    ]);
    expect(subtractIntervals([{ start: 0, end: 10 }], [{ start: -1, end: 11 }])).toEqual([]);
    expect(totalLength([{ start: 0, end: 2 }, { start: 1, end: 4 }, { start: 6, end: 7 }])).toBe(5);
  });
});
