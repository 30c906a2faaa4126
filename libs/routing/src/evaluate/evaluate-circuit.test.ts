import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { circuitDocumentSchema, type CircuitDocumentInput } from '../circuit/document.schema.js';
import { cutLengthTolerance } from '../lines/cut-length.js';
import { defaultShopRules } from '../rules/shop-rules.js';
import { coolerCircuit, coolerCircuitInput, testParts } from '../test-support/fixtures.js';
import { evaluateCircuit } from './evaluate-circuit.js';

const evaluate = (edit?: (d: CircuitDocumentInput) => void) => evaluateCircuit(coolerCircuit(edit), testParts, defaultShopRules);

describe('evaluateCircuit: cut list', () => {
  it('works one line through every term (DOMAIN.md worked check for the bend)', () => {
    // Cooler in at (100, 100) px, one corner at (100, 0) px with R = 2 in: two 10 in legs at 90°.
    const result = evaluate((d) => {
      d.units[1].x = 100;
      d.units[1].y = 100;
      d.lines[0].points = [{ x: 100, y: 0, bendRadiusIn: 2 }];
    });
    const line = result.lines[0];
    expect(line.drawnLengthIn).toBeCloseTo(20, 10);
    expect(line.centrelineIn).toBeCloseTo(20 - 4 + Math.PI, 10);
    expect(line.endStackFromIn).toBe(1.25); // adapter body 0.5 + hose end allowance 0.75
    expect(line.endStackToIn).toBe(0.75);
    expect(line.crossesMounts).toBe(true);
    expect(line.slackIn).toBe(1.5); // 4 % of 19.14 in is under the 1-1/2 in minimum
    expect(line.slackRule).toBe('cross-mount-minimum');
    expect(line.exactCutIn).toBeCloseTo(19.1416 - 2 + 1.5, 4);
    expect(line.cutLengthIn).toBe(18.75);
    expect(line.toleranceIn).toBe(3 / 16); // 12–24 in band, RMA IP-2 Table 4-8
    expect(line.fits).toBe(true);
  });

  it('a measured length overrides the drawn one; a line on one mount still gets 4 % slack (FAA AC 43.13-1B, ch. 9)', () => {
    const line = evaluate((d) => {
      d.units[1].mountGroup = 'powertrain';
      d.lines[0].measuredLengthIn = 41;
    }).lines[0];
    expect(line.basis).toBe('measured');
    expect(line.centrelineIn).toBe(30);
    expect(line.crossesMounts).toBe(false);
    // 4 % × 41 in = 1.64 in, more than the 1/2 in same-mount minimum (common practice).
    expect(line.slackIn).toBeCloseTo(1.64, 12);
    expect(line.slackRule).toBe('percent');
    expect(line.exactCutIn).toBeCloseTo(41 - 2 + 1.64, 12);
    expect(line.cutLengthIn).toBe(40.75); // 40.64 rounded up to the next 1/8 in
  });

  it('plans sleeves from the heat zone’s clearance plus the shop overlap, clamped to the line', () => {
    // Exhaust zone 2 in beside the line, 4 in long (13…17 in); clearance 6 in: the hose is within 6 in
    // wherever its distance to the zone's corner is ≤ 6, i.e. 15 ± (2 + √(6² − 2²)) in.
    const line = evaluate((d) => {
      d.heatZones = [{ id: 'hz', kind: 'exhaust', polygon: [{ x: 130, y: 20 }, { x: 170, y: 20 }, { x: 170, y: 60 }, { x: 130, y: 60 }] }];
    }).lines[0];
    const reach = 2 + Math.sqrt(36 - 4);
    expect(line.sleeves.requiredIn).toHaveLength(1);
    expect(line.sleeves.requiredIn[0].start).toBeCloseTo(15 - reach, 9);
    expect(line.sleeves.requiredIn[0].end).toBeCloseTo(15 + reach, 9);
    expect(line.sleeves.plannedIn[0].start).toBeCloseTo(15 - reach - 1, 9);
    expect(line.sleeves.plannedLengthIn).toBeCloseTo(2 * reach + 2, 9);
    expect(line.sleeves.contact).toBe(false);
    expect(line.sleeves.uncoveredIn).toHaveLength(1);
  });

  it('counts the bill of materials by hand', () => {
    const { bom } = evaluate();
    const row = (id: string) => bom.rows.find((r) => r.partId === id)!;
    // Cuts 29.5 and 28.75 in, plus 1/2 in trim each (common practice).
    expect(row('hose-6')).toMatchObject({ quantity: 59.25, unit: 'in', cuts: 2, priceCents: Math.round((900 * 59.25) / 12) });
    expect(row('end-6-straight')).toMatchObject({ quantity: 4, priceCents: 4800 });
    expect(row('adp-orb6-fl6').quantity).toBe(1);
    expect(row('adp-orb6-fl6-ln').quantity).toBe(1);
    // Two O-ring boss ports take an AS568-906 each (SAE J1926-1, from memory); pack of 25 at $20.
    expect(row('oring-906')).toMatchObject({ quantity: 2, priceCents: Math.round((2000 * 2) / 25) });
    expect(row('clamp-11-16')).toMatchObject({ quantity: 2, priceCents: Math.round((600 * 2) / 10) });
    expect(bom.subtotalCents).toBe(bom.rows.reduce((s, r) => s + (r.priceCents ?? 0), 0));
  });
});

/** A random but valid circuit: units with ports, lines between distinct ports, zones, parts by id. */
const circuitArbitrary = (options: { withCalibration?: boolean } = {}) => {
  const coord = fc.integer({ min: -2000, max: 2000 });
  const partIds = fc.constantFrom(...testParts.map((p) => p.id), 'ghost');
  const connection = fc.record({
    family: fc.constantFrom('flare37' as const, 'orb' as const, 'npt' as const, 'invflare45' as const),
    size: fc.constantFrom('-6', '-8', '1/4', '3/8'),
    gender: fc.constantFrom('male' as const, 'female' as const),
  });
  const port = (id: string) =>
    fc.record({
      id: fc.constant(id),
      connection,
      role: fc.constantFrom('out' as const, 'return' as const, 'feed' as const),
      dx: coord,
      dy: coord,
      requirement: fc.option(fc.constant({ feature: 'long-nose', reason: 'feeds lubrication' }), { nil: undefined }),
      feedsLubrication: fc.option(fc.boolean(), { nil: undefined }),
      plugPartId: fc.option(partIds, { nil: undefined }),
    });
  const unit = (id: string) =>
    fc.record({
      id: fc.constant(id),
      kind: fc.constantFrom('transmission' as const, 'cooler' as const, 'valve' as const),
      x: coord,
      y: coord,
      rotation: fc.integer({ min: -180, max: 180 }),
      mountGroup: fc.constantFrom('powertrain' as const, 'chassis' as const, 'axle' as const),
      valveKind: fc.option(fc.constant('thermostatic-bypass'), { nil: undefined }),
      ports: fc.tuple(port('a'), port('b'), port('c')),
    });
  const point = fc.record({ x: coord, y: coord, bendRadiusIn: fc.constantFrom(0, 0.5, 2, 6) });
  return fc
    .record({
      units: fc.tuple(unit('u0'), unit('u1'), unit('u2'), unit('u3')),
      lineSpecs: fc.array(
        fc.record({
          points: fc.array(point, { maxLength: 6 }),
          hosePartId: fc.option(partIds, { nil: null }),
          from: fc.array(partIds, { maxLength: 3 }),
          to: fc.array(partIds, { maxLength: 3 }),
          measured: fc.option(fc.integer({ min: 1, max: 400 }), { nil: null }),
          slack: fc.option(fc.integer({ min: 0, max: 5 }), { nil: null }),
          supports: fc.array(fc.integer({ min: 0, max: 300 }), { maxLength: 4 }),
          sleeves: fc.array(fc.tuple(fc.integer({ min: 0, max: 200 }), fc.integer({ min: 1, max: 100 })), { maxLength: 2 }),
        }),
        { maxLength: 6 },
      ),
      zones: fc.array(
        fc.record({ kind: fc.constantFrom('exhaust' as const, 'turbo' as const, 'other' as const), polygon: fc.array(fc.record({ x: coord, y: coord }), { minLength: 3, maxLength: 6 }) }),
        { maxLength: 3 },
      ),
      calibration: options.withCalibration === false ? fc.constant(null) : fc.option(fc.constant({ a: { x: 0, y: 0 }, b: { x: 100, y: 0 }, knownIn: 10 }), { nil: null, freq: 4 }),
      fluid: fc.constantFrom('atf' as const, 'e85' as const, 'engine-oil' as const),
    })
    .map(({ units, lineSpecs, zones, calibration, fluid }) => {
      // Each line takes two ports nobody else uses: ports are dealt out in order.
      const free = units.flatMap((u) => u.ports.map((p) => ({ unitId: u.id, portId: p.id })));
      const lines = lineSpecs.slice(0, Math.floor(free.length / 2)).map((spec, i) => ({
        id: `L${i}`,
        from: free[2 * i],
        to: free[2 * i + 1],
        hosePartId: spec.hosePartId,
        points: spec.points,
        measuredLengthIn: spec.measured,
        slackOverrideIn: spec.slack,
        endStacks: { from: spec.from, to: spec.to },
        supports: spec.supports.map((atIn, k) => ({ id: `s${k}`, atIn })),
        sleeves: spec.sleeves.map(([startIn, len], k) => ({ id: `v${k}`, startIn, endIn: startIn + len, partId: 'sleeve-3-4' })),
      }));
      const input: CircuitDocumentInput = {
        schema: 'linesmith.circuit/1',
        circuit: { fluid, maxPressurePsi: 150, maxTempF: 250 },
        calibration,
        background: null,
        units: units.map((u) => ({ ...u, ports: [...u.ports] })),
        lines,
        heatZones: zones.map((z, k) => ({ id: `z${k}`, ...z })),
      };
      return circuitDocumentSchema.parse(input);
    });
};

describe('evaluateCircuit: properties', () => {
  it('never throws on random valid documents, and returns one report per line (fast-check)', () => {
    fc.assert(
      fc.property(circuitArbitrary(), (doc) => {
        const result = evaluateCircuit(doc, testParts, defaultShopRules);
        expect(result.lines).toHaveLength(doc.lines.length);
        for (const flag of result.flags) expect(flag.message.length).toBeGreaterThan(0);
      }),
      { numRuns: 300 },
    );
  });

  it('gives the same flags in the same order when run twice', () => {
    fc.assert(
      fc.property(circuitArbitrary(), (doc) => {
        expect(evaluateCircuit(doc, testParts, defaultShopRules).flags).toEqual(evaluateCircuit(doc, testParts, defaultShopRules).flags);
      }),
      { numRuns: 50 },
    );
  });

  it('keeps sleeve intervals within the route (fast-check)', () => {
    fc.assert(
      fc.property(circuitArbitrary(), (doc) => {
        for (const line of evaluateCircuit(doc, testParts, defaultShopRules).lines) {
          const length = line.measuredLengthIn ?? line.centrelineIn ?? 0;
          for (const i of [...line.sleeves.requiredIn, ...line.sleeves.plannedIn]) {
            expect(i.start).toBeGreaterThanOrEqual(-1e-9);
            expect(i.end).toBeLessThanOrEqual(length + 1e-9);
            expect(i.end).toBeGreaterThanOrEqual(i.start);
          }
        }
      }),
      { numRuns: 200 },
    );
  });

  it('cut length grows with route length: stretching the sketch never shortens a cut (fast-check)', () => {
    fc.assert(
      fc.property(circuitArbitrary(), fc.double({ min: 1, max: 4, noNaN: true }), (doc, k) => {
        fc.pre(doc.calibration !== null);
        const stretched = structuredClone(doc);
        stretched.lines.forEach((l) => (l.measuredLengthIn = l.measuredLengthIn === null || l.measuredLengthIn === undefined ? l.measuredLengthIn : l.measuredLengthIn * k));
        stretched.units.forEach((u) => {
          u.x *= k;
          u.y *= k;
          u.ports.forEach((p) => {
            p.dx *= k;
            p.dy *= k;
          });
        });
        stretched.lines.forEach((l) => l.points.forEach((p) => ((p.x *= k), (p.y *= k))));
        const before = evaluateCircuit(doc, testParts, defaultShopRules).lines;
        const after = evaluateCircuit(stretched, testParts, defaultShopRules).lines;
        before.forEach((line, i) => {
          if (line.exactCutIn === null || !line.fits) return;
          expect(after[i].exactCutIn!).toBeGreaterThanOrEqual(line.exactCutIn - 1e-6);
          if (line.cutLengthIn !== null) expect(after[i].cutLengthIn!).toBeGreaterThanOrEqual(line.cutLengthIn);
        });
      }),
      { numRuns: 200 },
    );
  });

  it('a rounded cut is never short and stays within the RMA IP-2 Table 4-8 band of the exact cut', () => {
    fc.assert(
      fc.property(circuitArbitrary(), (doc) => {
        for (const line of evaluateCircuit(doc, testParts, defaultShopRules).lines) {
          if (line.cutLengthIn === null) continue;
          expect(line.cutLengthIn).toBeGreaterThanOrEqual(line.exactCutIn! - 1e-9);
          expect(line.cutLengthIn - line.exactCutIn!).toBeLessThanOrEqual(cutLengthTolerance(line.exactCutIn!));
        }
      }),
      { numRuns: 100 },
    );
  });

  it('the fixture input is not changed by evaluation', () => {
    const doc = coolerCircuit();
    const copy = structuredClone(doc);
    evaluateCircuit(doc, testParts, defaultShopRules);
    expect(doc).toEqual(copy);
    expect(coolerCircuitInput().lines).toHaveLength(2);
  });
});
