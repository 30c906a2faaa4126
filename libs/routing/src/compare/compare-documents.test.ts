import fc from 'fast-check';
import { isDeepStrictEqual } from 'node:util';
import { describe, expect, it } from 'vitest';
import { evaluateCircuit } from '../evaluate/evaluate-circuit.js';
import { defaultShopRules } from '../rules/shop-rules.js';
import { coolerCircuit, testParts } from '../test-support/fixtures.js';
import { compareDocuments } from './compare-documents.js';
import { sameValue } from './same-value.js';

const evaluate = (doc: ReturnType<typeof coolerCircuit>) => evaluateCircuit(doc, testParts, defaultShopRules);

/** The same data with every object's keys in reverse order. */
function reverseKeys(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(reverseKeys);
  if (typeof value !== 'object' || value === null) return value;
  return Object.fromEntries(Object.entries(value).reverse().map(([key, item]) => [key, reverseKeys(item)]));
}

const exhaust = {
  id: 'Z1',
  label: 'exhaust',
  kind: 'exhaust' as const,
  polygon: [
    { x: 100, y: 80 },
    { x: 200, y: 80 },
    { x: 200, y: 120 },
  ],
};

describe('compareDocuments', () => {
  it('finds nothing between a document and a copy of it with keys in another order', () => {
    const before = coolerCircuit();
    // jsonb hands documents back with keys reordered; that is not a change.
    const reordered = reverseKeys(before) as typeof before;
    expect(Object.keys(reordered.lines[0]!)[0]).toBe(Object.keys(before.lines[0]!).at(-1));
    const comparison = compareDocuments(before, reordered, evaluate(before), evaluate(reordered));
    expect(comparison).toEqual({
      settings: [],
      units: { added: [], removed: [], moved: [], changed: [] },
      lines: { added: [], removed: [], rerouted: [], partsSwapped: [] },
      heatZones: { added: [], removed: [], changed: [] },
      supports: [],
      sleeves: [],
      changedIds: [],
    });
  });

  it('reports a re-routed line with its old and new cut length (DOMAIN §4 worked by hand)', () => {
    const before = coolerCircuit();
    // L1 gets one corner at (150, 150) px = (15, 15) in with a 2 in radius: two legs of
    // √(15² + 15²) = 21.2132 in meeting at 90°. Centreline (DOMAIN §4) = 42.4264 − 2·2·tan 45° + 2·π/2
    // = 41.5680 in. Cut = 41.5680 − 1.25 (adapter 0.5 + hose end 0.75) − 0.75 (hose end) + slack
    // max(1.5, 4 % × 41.5680 = 1.6627) (FAA AC 43.13-1B, common practice) = 41.2307 → up to 1/8 = 41-1/4 in.
    // Before: 30 − 1.25 − 0.75 + max(1.5, 1.2) = 29.5 in.
    const after = coolerCircuit((doc) => {
      doc.lines[0]!.points = [{ x: 150, y: 150, bendRadiusIn: 2 }];
    });
    const comparison = compareDocuments(before, after, evaluate(before), evaluate(after));
    expect(comparison.lines.rerouted).toEqual([{ lineId: 'L1', oldCutLengthIn: 29.5, newCutLengthIn: 41.25 }]);
    expect(comparison.lines.partsSwapped).toEqual([]);
    expect(comparison.changedIds).toEqual(['L1']);
  });

  it('counts a measured length as a re-route, and leaves cut lengths out without evaluations', () => {
    const before = coolerCircuit();
    const after = coolerCircuit((doc) => {
      doc.lines[1]!.measuredLengthIn = 40;
    });
    expect(compareDocuments(before, after).lines.rerouted).toEqual([{ lineId: 'L2' }]);
    // 40 − 0.75 − 2 (hose end 0.75 + long-nose adapter 1.25) + max(1.5, 1.6) = 38.85 → 38-7/8 in.
    expect(compareDocuments(before, after, evaluate(before), evaluate(after)).lines.rerouted).toEqual([
      { lineId: 'L2', oldCutLengthIn: 28.75, newCutLengthIn: 38.875 },
    ]);
  });

  it('re-routes the lines of a unit that moved, and tells a move from an edit', () => {
    const before = coolerCircuit();
    const after = coolerCircuit((doc) => {
      doc.units[1]!.x = 350;
      doc.units[0]!.label = 'Gearbox';
    });
    const comparison = compareDocuments(before, after);
    expect(comparison.units).toEqual({ added: [], removed: [], moved: ['cooler'], changed: ['trans'] });
    expect(comparison.lines.rerouted.map((line) => line.lineId)).toEqual(['L1', 'L2']);
    expect(comparison.changedIds).toEqual(['L1', 'L2', 'cooler', 'trans']);
  });

  it('lists swapped hoses and end stacks with old and new part ids', () => {
    const before = coolerCircuit();
    const after = coolerCircuit((doc) => {
      doc.lines[0]!.endStacks.from = ['adp-orb6-fl6-ln', 'end-6-straight'];
      doc.lines[1]!.hosePartId = null;
    });
    expect(compareDocuments(before, after).lines.partsSwapped).toEqual([
      { lineId: 'L1', slot: 'end-from', oldPartIds: ['adp-orb6-fl6', 'end-6-straight'], newPartIds: ['adp-orb6-fl6-ln', 'end-6-straight'] },
      { lineId: 'L2', slot: 'hose', oldPartIds: ['hose-6'], newPartIds: [] },
    ]);
  });

  it('lists added and removed lines, units and heat zones, and changed zones', () => {
    const before = coolerCircuit((doc) => {
      doc.heatZones = [exhaust, { ...exhaust, id: 'Z2' }];
    });
    const after = coolerCircuit((doc) => {
      doc.lines = [doc.lines[0]!];
      doc.units.push({ id: 'valve', kind: 'valve', x: 500, y: 0, mountGroup: 'chassis', ports: [] });
      doc.heatZones = [{ ...exhaust, clearanceIn: 8 }, { ...exhaust, id: 'Z3' }];
    });
    const comparison = compareDocuments(before, after);
    expect(comparison.lines.added).toEqual([]);
    expect(comparison.lines.removed).toEqual(['L2']);
    expect(comparison.units.added).toEqual(['valve']);
    expect(comparison.heatZones).toEqual({ added: ['Z3'], removed: ['Z2'], changed: ['Z1'] });
    expect(comparison.changedIds).toEqual(['L2', 'Z1', 'Z2', 'Z3', 'valve']);
  });

  it('lists supports and sleeves added, removed and moved per line', () => {
    const before = coolerCircuit((doc) => {
      doc.lines[0]!.sleeves = [{ id: 'sv1', startIn: 5, endIn: 12, partId: null }];
    });
    const after = coolerCircuit((doc) => {
      doc.lines[0]!.supports = [
        { id: 's1', atIn: 14 },
        { id: 's2', atIn: 25 },
      ];
      doc.lines[0]!.sleeves = [];
      doc.lines[1]!.supports = [];
      doc.lines[1]!.sleeves = [{ id: 'sv2', startIn: 1, endIn: 4, partId: null }];
    });
    const comparison = compareDocuments(before, after);
    expect(comparison.supports).toEqual([
      { lineId: 'L1', added: ['s2'], removed: [], changed: ['s1'] },
      { lineId: 'L2', added: [], removed: ['s1'], changed: [] },
    ]);
    expect(comparison.sleeves).toEqual([
      { lineId: 'L1', added: [], removed: ['sv1'], changed: [] },
      { lineId: 'L2', added: ['sv2'], removed: [], changed: [] },
    ]);
    expect(comparison.lines.rerouted).toEqual([]);
    expect(comparison.changedIds).toEqual(['L1', 'L2']);
  });

  it('names circuit settings, calibration and background that changed', () => {
    const before = coolerCircuit();
    const after = coolerCircuit((doc) => {
      doc.circuit.maxPressurePsi = 200;
      doc.calibration = { a: { x: 0, y: 0 }, b: { x: 200, y: 0 }, knownIn: 10 };
    });
    const comparison = compareDocuments(before, after, evaluate(before), evaluate(after));
    expect(comparison.settings).toEqual(['maxPressurePsi', 'calibration']);
    // A new scale halves every drawn length: both lines are re-routed through their cut lengths.
    expect(comparison.lines.rerouted.map((line) => line.lineId)).toEqual(['L1', 'L2']);
  });
});

describe('sameValue', () => {
  // Reference: Node's util.isDeepStrictEqual on JSON data (JSON round trip folds -0 into 0).
  it('agrees with util.isDeepStrictEqual on JSON values', () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.jsonValue(), (a, b) => {
        const [x, y] = [JSON.parse(JSON.stringify(a)), JSON.parse(JSON.stringify(b))];
        expect(sameValue(x, y)).toBe(isDeepStrictEqual(x, y));
        expect(sameValue(x, structuredClone(x))).toBe(true);
      }),
    );
  });

  it('ignores key order and keys holding undefined', () => {
    expect(sameValue({ a: 1, b: [1, { c: 2 }] }, { b: [1, { c: 2 }], a: 1 })).toBe(true);
    expect(sameValue({ a: 1, b: undefined }, { a: 1 })).toBe(true);
    expect(sameValue({ a: 1 }, { a: 1, b: null })).toBe(false);
    expect(sameValue([1, 2], { 0: 1, 1: 2 })).toBe(false);
  });
});
