import { demoParts, solveAdapters, type ConnectionSpec, type Part } from '@linesmith/catalog';
import {
  circuitDocumentSchema,
  defaultShopRules,
  evaluateCircuit,
  type CircuitDocument,
  type CircuitDocumentInput,
} from '@linesmith/routing';
import { DEMO_CIRCUITS } from './demo-build-data.js';

/**
 * Re-checks the demo shop as a fabricator would build it: each demo circuit gets its lines drawn
 * straight port to port (10 px to the inch), the hose for its fluid, a straight, 45° or 90° hose end at each end,
 * the adapters the solver suggests first (meeting the port's requirement) and the supports the engine
 * proposes. What is left must be notes only: no blocker or caution the suggested parts cannot clear.
 */
const PX_PER_IN = 10;

const linesOf: Record<string, Array<{ from: [string, string]; to: [string, string]; hose: string }>> = {
  'Transmission cooler': [
    { from: ['transmission', 'cooler-out'], to: ['cooler', 'in'], hose: 'demo-hose-6-rubber' },
    { from: ['cooler', 'out'], to: ['transmission', 'cooler-return'], hose: 'demo-hose-6-rubber' },
  ],
  'Engine-oil cooler': [
    { from: ['engine', 'to-cooler'], to: ['oil-cooler', 'in'], hose: 'demo-hose-8-rubber' },
    { from: ['oil-cooler', 'out'], to: ['engine', 'from-cooler'], hose: 'demo-hose-8-rubber' },
  ],
  'Fuel return system': [
    { from: ['tank', 'pump-out'], to: ['filter', 'in'], hose: 'demo-hose-8-rubber' },
    { from: ['filter', 'out'], to: ['rail', 'in'], hose: 'demo-hose-8-rubber' },
    { from: ['rail', 'out'], to: ['regulator', 'in'], hose: 'demo-hose-6-rubber' },
    { from: ['regulator', 'return'], to: ['tank', 'return'], hose: 'demo-hose-6-rubber' },
  ],
};

const byId = new Map(demoParts.map((p) => [p.id, p]));

function hoseEndFor(hoseId: string, angle: number): Part {
  const hose = byId.get(hoseId);
  if (hose?.kind !== 'hose') throw new Error(`no demo hose ${hoseId}`);
  const end = demoParts.find(
    (p) => p.kind === 'hose-end' && p.attributes.angle === angle && p.attributes.hoseDash === hose.attributes.dash && p.attributes.hoseTypes.includes(hose.attributes.hoseType),
  );
  if (!end) throw new Error(`no ${angle}° hose end for ${hoseId}`);
  return end;
}

function built(name: string, angle: number): CircuitDocument {
  const demo = DEMO_CIRCUITS.find((c) => c.name === name)!;
  const input: CircuitDocumentInput = structuredClone(demo.document);
  input.calibration = { a: { x: 0, y: 0 }, b: { x: 10 * PX_PER_IN, y: 0 }, knownIn: 10 };
  const doc = circuitDocumentSchema.parse(input);
  const portOf = ([unitId, portId]: [string, string]) => {
    const unit = doc.units.find((u) => u.id === unitId)!;
    return { unit, port: unit.ports.find((p) => p.id === portId)! };
  };
  const stackFor = (ref: [string, string], end: Part) => {
    const { port } = portOf(ref);
    const side = (end as Extract<Part, { kind: 'hose-end' }>).attributes.port;
    const [chain] = solveAdapters(port.connection, side as ConnectionSpec, demoParts, port.requirement ? { requirement: port.requirement } : {});
    if (!chain) throw new Error(`no adapter chain for ${ref.join('/')}`);
    return [...chain.parts.map((p) => p.id), end.id];
  };
  doc.lines = linesOf[name].map((l, i) => {
    const end = hoseEndFor(l.hose, angle);
    return {
      id: `L${i + 1}`,
      from: { unitId: l.from[0], portId: l.from[1] },
      to: { unitId: l.to[0], portId: l.to[1] },
      hosePartId: l.hose,
      points: [],
      endStacks: { from: stackFor(l.from, end), to: stackFor(l.to, end) },
      supports: [],
      sleeves: [],
    };
  });
  // The supports the engine proposes for each line.
  const first = evaluateCircuit(doc, demoParts, defaultShopRules);
  for (const line of doc.lines) {
    const report = first.lines.find((r) => r.lineId === line.id)!;
    line.supports = report.supports.proposedAtIn.map((atIn, k) => ({ id: `s${k + 1}`, atIn }));
  }
  return doc;
}

describe('demo shop: the demo circuits built from the suggested parts', () => {
  it.each(DEMO_CIRCUITS.flatMap((c) => [0, 45, 90].map((angle) => [c.name, angle] as const)))('%s with %i° hose ends leaves notes only', (name, angle) => {
    const doc = built(name, angle);
    const result = evaluateCircuit(doc, demoParts, defaultShopRules);
    const serious = result.flags.filter((f) => f.severity !== 'note').map((f) => `${f.severity} ${f.code} ${f.target.id}: ${f.message}`);
    expect(serious).toEqual([]);
    // Slack on every line: the percentage or the mount case's minimum, never none.
    for (const line of result.lines) expect(line.slackIn).toBeGreaterThanOrEqual(defaultShopRules.slackMinSameMountIn);
  });
});
