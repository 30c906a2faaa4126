import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { CircuitDocument, CircuitLine, CircuitUnit, HeatZone } from '../circuit/document.schema.js';
import { defaultShopRules } from '../rules/shop-rules.js';
import { coolerCircuit, testParts } from '../test-support/fixtures.js';
import { createEvaluator } from './create-evaluator.js';
import { evaluateCircuit } from './evaluate-circuit.js';

/** Small seeded generator (mulberry32), so a failing case replays from its seed. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Random = () => number;
const pick = <T,>(r: Random, list: readonly T[]): T => list[Math.floor(r() * list.length)];
const STACKS = [[], ['end-6-straight'], ['adp-orb6-fl6', 'end-6-straight'], ['adp-orb6-fl6-ln', 'end-6-straight'], ['oring-906', 'adp-orb6-fl6', 'end-6-straight'], ['no-such-part'], ['clamp-11-16', 'end-6-straight']];
const HOSES = ['hose-6', 'hose-6', 'hose-6', null, 'no-such-hose', 'end-6-straight'];
const PLUGS = [undefined, null, 'plug-orb6', 'no-such-plug', 'hose-6'];
const CONNECTIONS = [
  { family: 'orb', size: '-6', gender: 'female' },
  { family: 'flare37', size: '-6', gender: 'male' },
  { family: 'flare37', size: '-6', gender: 'female' },
  { family: 'orb', size: '-8', gender: 'female' },
] as const;

function randomUnit(r: Random, id: string): CircuitUnit {
  const valve = r() < 0.15;
  return {
    id,
    kind: valve ? 'valve' : pick(r, ['transmission', 'cooler', 'engine'] as const),
    label: r() < 0.5 ? `Unit ${id}` : '',
    x: Math.round(r() * 600),
    y: Math.round(r() * 400),
    rotation: pick(r, [0, 0, 90, 33]),
    mountGroup: pick(r, ['powertrain', 'chassis', 'axle'] as const),
    ...(valve ? { valveKind: 'thermostatic-bypass' } : {}),
    ports: Array.from({ length: 2 + Math.floor(r() * 3) }, (_, p) => ({
      id: `p${p}`,
      label: r() < 0.5 ? `port ${p}` : '',
      connection: { ...pick(r, CONNECTIONS) },
      role: pick(r, ['out', 'return', 'feed'] as const),
      dx: Math.round(r() * 80 - 40),
      dy: Math.round(r() * 80 - 40),
      ...(r() < 0.15 ? { requirement: { feature: 'long-nose', reason: 'it feeds the gear train' } } : {}),
      ...(r() < 0.2 ? { feedsLubrication: true } : {}),
      ...(r() < 0.4 ? { plugPartId: pick(r, PLUGS) } : {}),
    })),
  };
}

function randomPoints(r: Random) {
  return Array.from({ length: Math.floor(r() * 5) }, () => ({ x: Math.round(r() * 600), y: Math.round(r() * 400), bendRadiusIn: pick(r, [0, 1, 3, 6]) }));
}

function freePorts(doc: CircuitDocument): Array<{ unitId: string; portId: string }> {
  const used = new Set(doc.lines.flatMap((l) => [`${l.from.unitId}/${l.from.portId}`, `${l.to.unitId}/${l.to.portId}`]));
  return doc.units.flatMap((u) => u.ports.map((p) => ({ unitId: u.id, portId: p.id }))).filter((p) => !used.has(`${p.unitId}/${p.portId}`));
}

let serial = 0;
function randomLine(r: Random, doc: CircuitDocument): CircuitLine | undefined {
  const free = freePorts(doc);
  if (free.length < 2) return undefined;
  const from = pick(r, free);
  const to = pick(r, free.filter((p) => p !== from));
  return {
    id: `L${serial++}`,
    from,
    to,
    hosePartId: pick(r, HOSES),
    points: randomPoints(r),
    measuredLengthIn: r() < 0.2 ? 20 + Math.round(r() * 40) : null,
    slackOverrideIn: r() < 0.1 ? 0.25 : null,
    endStacks: { from: [...pick(r, STACKS)], to: [...pick(r, STACKS)] },
    supports: Array.from({ length: Math.floor(r() * 3) }, (_, k) => ({ id: `s${k}`, atIn: 5 + 10 * k })),
    sleeves: r() < 0.3 ? [{ id: 'v0', startIn: 2, endIn: 2 + Math.round(r() * 30), partId: pick(r, ['sleeve-3-4', null, 'hose-6']) }] : [],
  };
}

function randomZone(r: Random, id: string): HeatZone {
  const cx = r() * 600;
  const cy = r() * 400;
  const n = 3 + Math.floor(r() * 30);
  return {
    id,
    label: r() < 0.5 ? `zone ${id}` : '',
    kind: pick(r, ['exhaust', 'turbo', 'other'] as const),
    polygon: Array.from({ length: n }, (_, k) => ({ x: cx + 60 * Math.cos((2 * Math.PI * k) / n), y: cy + 40 * Math.sin((2 * Math.PI * k) / n) })),
    ...(r() < 0.3 ? { clearanceIn: pick(r, [0, 2, 10]) } : {}),
  };
}

function randomCircuit(r: Random): CircuitDocument {
  let doc: CircuitDocument = {
    ...coolerCircuit(),
    units: Array.from({ length: 2 + Math.floor(r() * 5) }, (_, u) => randomUnit(r, `u${u}`)),
    lines: [],
    heatZones: Array.from({ length: Math.floor(r() * 4) }, (_, z) => randomZone(r, `z${z}`)),
  };
  for (let i = 0; i < 1 + r() * 6; i++) {
    const line = randomLine(r, doc);
    if (line) doc = { ...doc, lines: [...doc.lines, line] };
  }
  return doc;
}

const replaceAt = <T,>(list: readonly T[], i: number, value: T): T[] => list.map((x, k) => (k === i ? value : x));

/** One editor-like change, sharing every object it does not touch (as the editor's commands do). */
function randomEdit(r: Random, doc: CircuitDocument): CircuitDocument {
  if (doc.units.length === 0) return { ...doc, units: [randomUnit(r, `u${serial++}`)] };
  const lineAt = doc.lines.length > 0 ? Math.floor(r() * doc.lines.length) : -1;
  const line = lineAt >= 0 ? doc.lines[lineAt] : undefined;
  const withLine = (next: CircuitLine) => ({ ...doc, lines: replaceAt(doc.lines, lineAt, next) });
  const unitAt = Math.floor(r() * doc.units.length);
  const unit = doc.units[unitAt];
  const withUnit = (next: CircuitUnit) => ({ ...doc, units: replaceAt(doc.units, unitAt, next) });
  switch (Math.floor(r() * 17)) {
    case 0:
    case 1:
      if (!line || line.points.length === 0) return doc;
      {
        const k = Math.floor(r() * line.points.length);
        const p = line.points[k];
        return withLine({ ...line, points: replaceAt(line.points, k, { ...p, x: p.x + Math.round(r() * 40 - 20), y: p.y + Math.round(r() * 40 - 20) }) });
      }
    case 2:
      return line ? withLine({ ...line, points: randomPoints(r) }) : doc;
    case 3:
      return withUnit({ ...unit, x: unit.x + Math.round(r() * 60 - 30), rotation: r() < 0.3 ? 45 : unit.rotation });
    case 4: {
      if (unit.ports.length === 0) return doc;
      const k = Math.floor(r() * unit.ports.length);
      return withUnit({ ...unit, ports: replaceAt(unit.ports, k, { ...unit.ports[k], plugPartId: pick(r, PLUGS), label: r() < 0.5 ? 'relabelled' : unit.ports[k].label }) });
    }
    case 5:
      return line ? withLine({ ...line, hosePartId: pick(r, HOSES) }) : doc;
    case 6:
      return line ? withLine({ ...line, endStacks: { ...line.endStacks, [r() < 0.5 ? 'from' : 'to']: [...pick(r, STACKS)] } }) : doc;
    case 7: {
      const added = randomLine(r, doc);
      return added ? { ...doc, lines: [...doc.lines, added] } : doc;
    }
    case 8:
      return line ? { ...doc, lines: doc.lines.filter((_, k) => k !== lineAt) } : doc;
    case 9: {
      const free = freePorts(doc);
      return line && free.length > 0 ? withLine({ ...line, to: pick(r, free) }) : doc;
    }
    case 10:
      return r() < 0.5 && doc.heatZones.length > 0
        ? { ...doc, heatZones: doc.heatZones.slice(1) }
        : { ...doc, heatZones: [...doc.heatZones, randomZone(r, `z${serial++}`)] };
    case 11:
      return { ...doc, calibration: r() < 0.15 ? null : { a: { x: 0, y: 0 }, b: { x: 100, y: 0 }, knownIn: pick(r, [8, 10, 12]) } };
    case 12:
      return { ...doc, circuit: { ...doc.circuit, maxPressurePsi: pick(r, [150, 400, 5000]), fluid: pick(r, ['atf', 'e85'] as const) } };
    case 13:
      return line ? withLine({ ...line, supports: r() < 0.5 ? [] : [{ id: 's9', atIn: 3 }], measuredLengthIn: r() < 0.3 ? 44 : null }) : doc;
    case 14:
      return JSON.parse(JSON.stringify(doc)) as CircuitDocument; // equal content, all new objects
    case 15:
      return { ...doc, units: [...doc.units, randomUnit(r, `u${serial++}`)] };
    default:
      return r() < 0.5 ? doc : { ...doc, units: doc.units.filter((_, k) => k !== unitAt) }; // a line may now point nowhere
  }
}

describe('createEvaluator', () => {
  const full = (doc: CircuitDocument) => evaluateCircuit(doc, testParts, defaultShopRules, { taxRatePercent: 7.5 });

  it('gives exactly what evaluateCircuit gives, edit after edit (thousands of random edits)', () => {
    fc.assert(
      fc.property(fc.integer(), (seed) => {
        const r = seeded(seed);
        const evaluator = createEvaluator(testParts, defaultShopRules, { taxRatePercent: 7.5 });
        let doc = randomCircuit(r);
        expect(evaluator.evaluate(doc)).toEqual(full(doc));
        for (let step = 0; step < 25; step++) {
          doc = randomEdit(r, doc);
          expect(evaluator.evaluate(doc)).toEqual(full(doc));
        }
      }),
      { numRuns: 160 }, // 160 circuits × 25 edits = 4,000 edits
    );
  }, 120_000);

  it('re-works only the line that changed, and nothing for the same document', () => {
    const doc = coolerCircuit((d) => {
      d.lines[0].points = [{ x: 150, y: 40, bendRadiusIn: 3 }];
    });
    const evaluator = createEvaluator(testParts, defaultShopRules, { taxRatePercent: 7.5 });
    evaluator.evaluate(doc);
    expect(evaluator.lastReworkedLines).toBe(2);
    evaluator.evaluate(doc);
    expect(evaluator.lastReworkedLines).toBe(0);
    const moved = { ...doc, lines: [{ ...doc.lines[0], points: [{ x: 150, y: 60, bendRadiusIn: 3 }] }, doc.lines[1]] };
    const result = evaluator.evaluate(moved);
    expect(evaluator.lastReworkedLines).toBe(1);
    expect(result).toEqual(full(moved));
    evaluator.evaluate(JSON.parse(JSON.stringify(moved)) as CircuitDocument);
    expect(evaluator.lastReworkedLines).toBe(0); // equal content counts as unchanged
  });

  it('works a line out again when a unit at its end moves', () => {
    const doc = coolerCircuit();
    const evaluator = createEvaluator(testParts, defaultShopRules, { taxRatePercent: 7.5 });
    evaluator.evaluate(doc);
    const moved = { ...doc, units: [doc.units[0], { ...doc.units[1], x: doc.units[1].x + 100 }] };
    const result = evaluator.evaluate(moved);
    expect(evaluator.lastReworkedLines).toBe(2); // both lines end on the cooler
    expect(result.lines[0].centrelineIn).toBeCloseTo(40, 9);
    expect(result).toEqual(full(moved));
  });
});
