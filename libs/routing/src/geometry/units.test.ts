import { describe, expect, it } from 'vitest';
import { pointIn, pointPx, pointPxToIn, px, pxPerIn, pxToIn, type Inches, type PointIn } from './units.js';

describe('sketch pixels and inches', () => {
  it('keeps the two apart for the type checker (tsc -p tsconfig.test.json checks the expect-error lines)', () => {
    const sketch = pointPx(120, 50);
    // @ts-expect-error a point in sketch pixels is not a point in inches
    const wrong: PointIn = sketch;
    // @ts-expect-error a pixel distance is not a length in inches
    const wrongLength: Inches = px(40);
    expect([wrong, wrongLength]).toHaveLength(2); // at run time both are plain values
    expect(pointPxToIn(sketch, 10)).toEqual(pointIn(12, 5));
    expect(pxToIn(px(40), 10)).toBe(4);
  });

  it('scale = pixel distance between the calibration points ÷ the known distance', () => {
    expect(pxPerIn({ a: { x: 0, y: 0 }, b: { x: 300, y: 400 }, knownIn: 25 })).toBe(20); // 3-4-5: 500 px over 25 in
  });
});
