import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { coolerCircuitInput } from '../test-support/fixtures.js';
import { circuitDocumentSchema, CIRCUIT_SCHEMA, SKETCH_LIMITS } from './document.schema.js';
import { CircuitVersionError, migrateCircuitDocument, migrateWith } from './migrate.js';

describe('circuitDocumentSchema', () => {
  it('accepts the cooler circuit and fills defaults', () => {
    const doc = circuitDocumentSchema.parse(coolerCircuitInput());
    expect(doc.schema).toBe(CIRCUIT_SCHEMA);
    expect(doc.lines[0].supports).toHaveLength(1);
    expect(doc.units[0].rotation).toBe(0);
  });

  it('names the path of a line that points at a missing port', () => {
    const input = coolerCircuitInput();
    input.lines[1].to.portId = 'nope';
    const result = circuitDocumentSchema.safeParse(input);
    expect(result.success).toBe(false);
    const issue = result.error!.issues[0];
    expect(issue.path).toEqual(['lines', 1, 'to', 'portId']);
    expect(issue.message).toContain('"nope"');
  });

  it('rejects repeated ids, a port taking two lines, a two-point heat zone and a backwards sleeve', () => {
    const input = coolerCircuitInput();
    input.lines[1].id = 'L1';
    input.lines[1].from = { unitId: 'trans', portId: 'out' };
    input.heatZones = [{ id: 'z', kind: 'exhaust', polygon: [{ x: 0, y: 0 }, { x: 1, y: 1 }] }];
    input.lines[0].sleeves = [{ id: 'sl', startIn: 5, endIn: 2, partId: null }];
    const paths = circuitDocumentSchema.safeParse(input).error!.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(expect.arrayContaining(['heatZones.0.polygon', 'lines.0.sleeves.0.endIn']));
    const refined = coolerCircuitInput();
    refined.lines[1].id = 'L1';
    refined.lines[1].from = { unitId: 'trans', portId: 'out' };
    const refinedPaths = circuitDocumentSchema.safeParse(refined).error!.issues.map((i) => i.path.join('.'));
    expect(refinedPaths).toEqual(['lines.1.id', 'lines.1.from']);
  });

  it('rejects random corruptions of a valid document with a path in the issue (property)', () => {
    type Mutation = { name: string; apply: (doc: ReturnType<typeof coolerCircuitInput>) => void; path: RegExp };
    const mutations: Mutation[] = [
      { name: 'unit id', apply: (d) => (d.units[1].id = d.units[0].id), path: /^(units\.1\.id|lines\.\d\.(from|to)\.(unitId|portId))$/ },
      { name: 'unknown unit', apply: (d) => (d.lines[0].from.unitId = 'ghost'), path: /^lines\.0\.from\.unitId$/ },
      { name: 'negative radius', apply: (d) => (d.lines[0].points = [{ x: 1, y: 1, bendRadiusIn: -1 }]), path: /^lines\.0\.points\.0\.bendRadiusIn$/ },
      { name: 'bad fluid', apply: (d) => ((d.circuit as { fluid: string }).fluid = 'milk'), path: /^circuit\.fluid$/ },
      { name: 'bad gender', apply: (d) => ((d.units[0].ports[0].connection as { gender: string }).gender = 'x'), path: /^units\.0\.ports\.0\.connection\.gender$/ },
      { name: 'zero scale', apply: (d) => (d.calibration = { a: { x: 1, y: 1 }, b: { x: 1, y: 1 }, knownIn: 5 }), path: /^calibration\.b$/ },
      { name: 'NaN point', apply: (d) => (d.units[0].x = Number.NaN), path: /^units\.0\.x$/ },
      { name: 'empty id', apply: (d) => (d.lines[0].id = ''), path: /^lines\.0\.id$/ },
      { name: 'wrong version', apply: (d) => ((d as { schema: string }).schema = 'linesmith.circuit/0'), path: /^schema$/ },
    ];
    fc.assert(
      fc.property(fc.subarray(mutations, { minLength: 1 }), (chosen) => {
        const input = coolerCircuitInput();
        chosen.forEach((m) => m.apply(input));
        const result = circuitDocumentSchema.safeParse(input);
        expect(result.success).toBe(false);
        // Cross-reference checks run once the shape is valid, so every issue names one of the corruptions.
        const paths = result.error!.issues.map((i) => i.path.join('.'));
        expect(paths.length).toBeGreaterThan(0);
        for (const p of paths) expect(chosen.some((m) => m.path.test(p))).toBe(true);
        if (chosen.length === 1) expect(paths.some((p) => chosen[0].path.test(p))).toBe(true);
      }),
    );
  });
});

describe('sketch limits (product bounds against hostile or corrupt documents)', () => {
  it('refuses positions, lengths and scales no real sketch reaches, naming the path', () => {
    const far = coolerCircuitInput();
    far.units[0].y = 2_147_483_648;
    expect(circuitDocumentSchema.safeParse(far).error!.issues.map((i) => i.path.join('.'))).toEqual(['units.0.y']);

    const tinyScale = coolerCircuitInput();
    tinyScale.calibration = { a: { x: 0, y: 0 }, b: { x: 10, y: 0 }, knownIn: 100 }; // 0.1 px/in
    expect(circuitDocumentSchema.safeParse(tinyScale).error!.issues.map((i) => i.path.join('.'))).toEqual(['calibration.knownIn']);

    const longMeasure = coolerCircuitInput();
    longMeasure.lines[0].measuredLengthIn = SKETCH_LIMITS.lengthIn + 1;
    expect(circuitDocumentSchema.safeParse(longMeasure).error!.issues.map((i) => i.path.join('.'))).toEqual(['lines.0.measuredLengthIn']);
  });

  it('accepts the edges of the bounds', () => {
    const edge = coolerCircuitInput();
    edge.units[0].x = SKETCH_LIMITS.coordinatePx;
    edge.calibration = { a: { x: 0, y: 0 }, b: { x: 50, y: 0 }, knownIn: 100 }; // 0.5 px/in
    expect(circuitDocumentSchema.safeParse(edge).success).toBe(true);
  });
});

describe('migrateCircuitDocument', () => {
  it('reads the current version as is', () => {
    expect(migrateCircuitDocument(coolerCircuitInput()).lines).toHaveLength(2);
  });

  it('reads a document saved before shields, port depths and the in role: the new fields are optional', () => {
    // As saved then: the cooler inlet marked feed, no shielded flag, no port depths.
    const old = coolerCircuitInput();
    old.units[1].ports[0].role = 'feed';
    old.heatZones = [{ id: 'hz', kind: 'exhaust', polygon: [{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 0, y: 10 }] }];
    const doc = migrateCircuitDocument(JSON.parse(JSON.stringify(old)));
    expect(doc.heatZones[0].shielded).toBeUndefined();
    expect(doc.units[0].ports[1].threadDepthIn).toBeUndefined();
    // And the new fields are validated: depths are positive inches.
    const bad = coolerCircuitInput();
    bad.units[0].ports[1].minReachIn = -1;
    expect(circuitDocumentSchema.safeParse(bad).success).toBe(false);
    const shielded = coolerCircuitInput();
    shielded.heatZones = [{ ...old.heatZones[0], shielded: true }];
    shielded.units[0].ports[1].role = 'in';
    expect(circuitDocumentSchema.parse(shielded).heatZones[0].shielded).toBe(true);
  });

  it('refuses an unknown version with a clear error', () => {
    expect(() => migrateCircuitDocument({ ...coolerCircuitInput(), schema: 'linesmith.circuit/9' })).toThrow(CircuitVersionError);
    expect(() => migrateCircuitDocument({ ...coolerCircuitInput(), schema: 'linesmith.circuit/9' })).toThrow(/linesmith\.circuit\/9.*cannot read/);
    expect(() => migrateCircuitDocument(null)).toThrow(CircuitVersionError);
  });

  it('runs a chain of up-migrations in order and stops on a loop', () => {
    const chain = {
      'v/1': (raw: Record<string, unknown>) => ({ ...raw, schema: 'v/2', steps: ['1→2'] }),
      'v/2': (raw: Record<string, unknown>) => ({ ...raw, schema: 'v/3', steps: [...(raw.steps as string[]), '2→3'] }),
    };
    expect(migrateWith({ schema: 'v/1' }, chain, 'v/3')).toEqual({ schema: 'v/3', steps: ['1→2', '2→3'] });
    expect(migrateWith({ schema: 'v/2', steps: [] }, chain, 'v/3')).toEqual({ schema: 'v/3', steps: ['2→3'] });
    const loop = { 'v/1': (raw: Record<string, unknown>) => ({ ...raw, schema: 'v/1' }) };
    expect(() => migrateWith({ schema: 'v/1' }, loop, 'v/3')).toThrow(CircuitVersionError);
  });
});
