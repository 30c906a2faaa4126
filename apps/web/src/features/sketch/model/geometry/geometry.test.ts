import { demoParts } from '@linesmith/catalog';
import { centrelineLength, defaultShopRules, evaluateCircuit } from '@linesmith/routing';
import { describe, expect, it } from 'vitest';
import { coolerSketch } from '../../test-support/sketch-fixtures';
import { cutLengthLabel } from '../../utils/cut-length-label';
import { calibrate } from '../commands/calibrate';
import { removeCorner } from '../commands/remove-corner';
import { sketchScale } from './calibration';
import { linePathIn, nearestSegment, routePx } from './line-route';
import { findPortNear, portTaken } from './snap-to-port';

/** The fixture with its line straightened: transmission return (180, 120) to cooler outlet (430, 325)... moved to a 3-4-5 triangle. */
function straightLine() {
  const doc = removeCorner(coolerSketch(), { lineId: 'return-line', index: 0 });
  // Return port at (180, 120); put the cooler so its outlet (dx −70, dy 25) sits at (480, 520): 300 × 400 px, 500 px apart.
  return { ...doc, units: doc.units.map((u) => (u.id === 'cooler' ? { ...u, x: 550, y: 495 } : u)) };
}

describe('calibration', () => {
  it('two points 200 px apart with a known 10 in give 20 px per inch', () => {
    const doc = calibrate(coolerSketch(), { a: { x: 0, y: 0 }, b: { x: 120, y: 160 }, knownIn: 10 });
    expect(sketchScale(doc)).toBeCloseTo(20, 12);
    expect(sketchScale({ ...doc, calibration: null })).toBeNull();
  });

  it('re-calibration rescales a drawn line (3-4-5 triangle: 500 px)', () => {
    const at20 = calibrate(straightLine(), { a: { x: 0, y: 0 }, b: { x: 200, y: 0 }, knownIn: 10 });
    const at10 = calibrate(at20, { a: { x: 0, y: 0 }, b: { x: 100, y: 0 }, knownIn: 10 });
    const drawn = (doc: typeof at20) => evaluateCircuit(doc, demoParts, defaultShopRules).lines[0].drawnLengthIn;
    expect(drawn(at20)).toBeCloseTo(25, 9);
    expect(drawn(at10)).toBeCloseTo(50, 9);
  });
});

describe('port snapping', () => {
  it('finds the nearest port within the radius and nothing beyond it', () => {
    const doc = coolerSketch();
    // Transmission ports at (180, 80) and (180, 120).
    expect(findPortNear(doc, { x: 183, y: 84 }, 6)).toMatchObject({ unitId: 'trans', portId: 'out', distance: 5 });
    expect(findPortNear(doc, { x: 180, y: 101 }, 30)?.portId).toBe('ret');
    expect(findPortNear(doc, { x: 190, y: 100 }, 6)).toBeNull();
    expect(portTaken(doc, { unitId: 'trans', portId: 'ret' })).toBe(true);
    expect(portTaken(doc, { unitId: 'trans', portId: 'out' })).toBe(false);
  });

  it('follows a rotated unit (90° clockwise turns +x into +y)', () => {
    const doc = coolerSketch();
    const turned = { ...doc, units: doc.units.map((u) => (u.id === 'trans' ? { ...u, rotation: 90 } : u)) };
    // Port out (dx 80, dy −20) turned 90° → (20, 80) from (100, 100).
    expect(findPortNear(turned, { x: 120, y: 180 }, 1)?.portId).toBe('out');
  });
});

describe('line route', () => {
  it('runs port → corners → port and finds the segment nearest a click', () => {
    const doc = coolerSketch();
    const route = routePx(doc, doc.lines[0])!;
    expect(route).toEqual([{ x: 180, y: 120 }, { x: 430, y: 120 }, { x: 430, y: 325 }]);
    expect(nearestSegment(route, { x: 300, y: 125 }).index).toBe(0);
    expect(nearestSegment(route, { x: 435, y: 250 }).index).toBe(1);
  });

  it('uses the same bend maths as the routing lib (DOMAIN §4 worked check: two 10 in legs at 90°, R 2 in → 19.1416 in)', () => {
    const doc = calibrate(coolerSketch(), { a: { x: 0, y: 0 }, b: { x: 10, y: 0 }, knownIn: 1 });
    const line = { ...doc.lines[0], points: [{ x: 280, y: 120, bendRadiusIn: 2 }] };
    const moved = { ...doc, units: doc.units.map((u) => (u.id === 'cooler' ? { ...u, x: 350, y: 195 } : u)), lines: [line] };
    const geometry = linePathIn(moved, line, 10, null)!;
    expect(geometry.path.lengthIn).toBeCloseTo(20 - 4 + Math.PI, 3);
    expect(centrelineLength([{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 10 }], [0, 2, 0]).lengthIn).toBeCloseTo(19.1416, 4);
  });
});

describe('cut length shown on a line', () => {
  it('is the routing lib’s cut length, and matches a hand-worked example', () => {
    const doc = calibrate(straightLine(), { a: { x: 0, y: 0 }, b: { x: 200, y: 0 }, knownIn: 10 });
    const report = evaluateCircuit(doc, demoParts, defaultShopRules).lines[0];
    // By hand (DOMAIN §4): 25 in − (0.95 + 0.8) − (1.05 + 0.8) + slack max(1-1/2, 4 % × 25) = 22.9 → up to the next 1/8: 23 in.
    expect(report.cutLengthIn).toBeCloseTo(23, 9);
    expect(cutLengthLabel(report, 'in')).toBe('Cut 23"');
    // 23 in × 25.4 mm/in (NIST SP 811) = 584.2 mm → up to 585 mm (common practice: cut long, never short).
    expect(cutLengthLabel(report, 'mm')).toBe('Cut 585 mm');
    // A cut off the 1/16 in grid rounds up too: 20.53 in × 16 = 328.48 → 329/16 = 20-9/16 in (nearest would be 20-1/2);
    // 20.53 × 25.4 = 521.462 mm → 522 mm (nearest would be 521).
    expect(cutLengthLabel({ ...report, cutLengthIn: 20.53 }, 'in')).toBe('Cut 20-9/16"');
    expect(cutLengthLabel({ ...report, cutLengthIn: 20.53 }, 'mm')).toBe('Cut 522 mm');
    expect(cutLengthLabel(evaluateCircuit({ ...doc, calibration: null }, demoParts, defaultShopRules).lines[0], 'in')).toMatch(/needs scale/);
  });
});
