import { describe, expect, it } from 'vitest';
import type { Part } from '@linesmith/catalog';
import type { CircuitDocumentInput } from '../circuit/document.schema.js';
import { evaluateCircuit } from '../evaluate/evaluate-circuit.js';
import { coolerCircuit, hoseEnd6, orbToFlare6, part, testParts } from '../test-support/fixtures.js';
import { ruleRegistry } from './registry.js';
import { defaultShopRules } from './shop-rules.js';

type Edit = (doc: CircuitDocumentInput) => void;
interface Case {
  code: string;
  /** Why the raising document is wrong, and the source for it. */
  source: string;
  raises: Edit;
  /** A near miss that must stay quiet; the clean cooler circuit when absent. */
  quiet?: Edit;
  parts?: Part[];
}

const ptfeOnlyEnd = part({ ...hoseEnd6, id: 'end-6-ptfe', attributes: { ...hoseEnd6.attributes, hoseTypes: ['ptfe-braided'] } });
const narrowAdapter = part({ ...orbToFlare6, id: 'adp-narrow', attributes: { ...orbToFlare6.attributes, boreIn: 0.2 } });
const coolSleeve = part({
  id: 'sleeve-cool',
  kind: 'sleeve',
  description: 'Low-temperature sleeve',
  attributes: { fitsOd: { minIn: 0.5, maxIn: 0.8 }, maxTempF: 200 },
});
const nptfPlug = part({
  id: 'plug-nptf4',
  kind: 'plug',
  description: '1/4 NPTF pipe plug',
  attributes: { connection: { family: 'nptf', size: '1/4', gender: 'male' }, maxPressurePsi: 3000 },
});
const extraParts = [...testParts, ptfeOnlyEnd, narrowAdapter, coolSleeve, nptfPlug];
const reach075 = part({ ...orbToFlare6, id: 'adp-reach-075', attributes: { ...orbToFlare6.attributes, reachIn: 0.75 } });

const portOf = (doc: CircuitDocumentInput, unitId: string, portId: string) =>
  doc.units.find((u) => u.id === unitId)!.ports.find((p) => p.id === portId)!;
const square = (cx: number, cy: number, half: number) => [
  { x: cx - half, y: cy - half },
  { x: cx + half, y: cy - half },
  { x: cx + half, y: cy + half },
  { x: cx - half, y: cy + half },
];
/** Puts a thermostatic bypass valve between the cooler and the transmission return. */
const withValve = (doc: CircuitDocumentInput) => {
  doc.units.push({
    id: 'valve',
    kind: 'valve',
    label: 'Bypass',
    valveKind: 'thermostatic-bypass',
    x: 300,
    y: 400,
    mountGroup: 'chassis',
    ports: [
      { id: 'in', connection: { family: 'flare37', size: '-6', gender: 'male' }, role: 'in', dx: 0, dy: 0 },
      { id: 'out', connection: { family: 'flare37', size: '-6', gender: 'male' }, role: 'out', dx: 0, dy: 20 },
    ],
  });
  const l2 = doc.lines[1];
  doc.lines.push({ ...structuredClone(l2), id: 'L3', from: { unitId: 'valve', portId: 'out' } });
  l2.to = { unitId: 'valve', portId: 'in' };
  l2.endStacks = { from: ['end-6-straight'], to: ['end-6-straight'] };
};

const cases: Case[] = [
  {
    code: 'joint-seat',
    source: 'SAE J514 / SAE J1926-1: a -6 37° flare and a -6 O-ring boss share 9/16-18 UNF but not the seat',
    raises: (d) => (portOf(d, 'cooler', 'in').connection = { family: 'orb', size: '-6', gender: 'male' }),
  },
  {
    code: 'joint-thread',
    source: 'SAE J514: -8 is 3/4-16 UNF, -6 is 9/16-18 UNF',
    raises: (d) => (portOf(d, 'cooler', 'in').connection = { family: 'flare37', size: '-8', gender: 'male' }),
  },
  {
    code: 'joint-gender',
    source: 'a female port cannot take a female swivel',
    raises: (d) => (portOf(d, 'cooler', 'in').connection = { family: 'flare37', size: '-6', gender: 'female' }),
  },
  {
    code: 'port-requirement',
    source: 'common practice: the return that feeds the gear train lubrication takes the long-nose fitting',
    raises: (d) => (d.lines[1].endStacks.to = ['adp-orb6-fl6', 'end-6-straight']),
  },
  {
    code: 'hose-end-size',
    source: 'a hose end is made for one hose dash and construction',
    raises: (d) => (d.lines[0].endStacks.to = ['end-6-ptfe']),
  },
  {
    code: 'rating-pressure',
    source: 'hose rated 350 psi on a 500 psi circuit',
    raises: (d) => (d.circuit.maxPressurePsi = 500),
    quiet: (d) => (d.circuit.maxPressurePsi = 350),
  },
  {
    code: 'rating-temperature',
    source: 'hose rated 300 °F, sleeve rated 200 °F on a 250 °F circuit',
    raises: (d) => (d.lines[0].sleeves = [{ id: 'sl', startIn: 1, endIn: 5, partId: 'sleeve-cool' }]),
    quiet: (d) => (d.lines[0].sleeves = [{ id: 'sl', startIn: 1, endIn: 5, partId: 'sleeve-3-4' }]),
  },
  {
    code: 'fluid',
    source: 'ethanol blends need a PTFE liner; the rubber hose lists ATF, engine oil and power steering only',
    raises: (d) => (d.circuit.fluid = 'e85'),
    quiet: (d) => (d.circuit.fluid = 'engine-oil'),
  },
  {
    code: 'joint-caution',
    source: 'ASME B1.20.3: NPTF against NPT joins but the dry seal is not assured (sealant needed)',
    raises: (d) => d.units[0].ports.push({ id: 'drain', connection: { family: 'npt', size: '1/4', gender: 'female' }, role: 'drain', dx: 0, dy: 100, plugPartId: 'plug-nptf4' }),
    quiet: (d) => d.units[0].ports.push({ id: 'drain', connection: { family: 'nptf', size: '1/4', gender: 'female' }, role: 'drain', dx: 0, dy: 100, plugPartId: 'plug-nptf4' }),
  },
  {
    code: 'bend-radius',
    source: 'SAE J517 / makers’ data: minimum 2 in to the inside; 2 in centreline − 0.69/2 in = 1.655 in inside',
    raises: (d) => (d.lines[0].points = [{ x: 150, y: 100, bendRadiusIn: 2 }]),
    quiet: (d) => (d.lines[0].points = [{ x: 150, y: 100, bendRadiusIn: 2.345 }]),
  },
  {
    code: 'bend-near-socket',
    source: 'common practice: 2 × 0.69 in OD straight past the 1.25 in of rigid fitting; this bend starts about 2.3 in from the port',
    raises: (d) => (d.lines[0].points = [{ x: 50, y: 50, bendRadiusIn: 9 }]),
    quiet: (d) => (d.lines[0].points = [{ x: 50, y: 50, bendRadiusIn: 4 }]),
  },
  {
    code: 'free-hose-length',
    source: 'common practice: 2 in free hose; 2 in measured + 1-1/2 in slack − 1-1/4 in − 3/4 in of fittings = 1-1/2 in',
    raises: (d) => (d.lines[0].measuredLengthIn = 2),
    quiet: (d) => (d.lines[0].measuredLengthIn = 3),
  },
  {
    code: 'measured-length',
    source: 'a real path is never shorter than the 30 in between the ports (common practice: 20 % allowance for perspective)',
    raises: (d) => (d.lines[0].measuredLengthIn = 3),
    quiet: (d) => (d.lines[0].measuredLengthIn = 24.5),
  },
  {
    code: 'heat-contact',
    source: 'the route crosses an exhaust zone',
    raises: (d) => (d.heatZones = [{ id: 'hz', kind: 'exhaust', polygon: square(150, 0, 20) }]),
    quiet: (d) => (d.heatZones = [{ id: 'hz', kind: 'exhaust', polygon: square(150, 100, 20) }]),
  },
  {
    code: 'heat-sleeve',
    source: 'common practice: 6 in from exhaust; the zone is 2 in from the line',
    raises: (d) => (d.heatZones = [{ id: 'hz', kind: 'exhaust', polygon: square(150, 40, 20) }]),
    quiet: (d) => {
      d.heatZones = [{ id: 'hz', kind: 'exhaust', polygon: square(150, 40, 20) }];
      d.lines[0].sleeves = [{ id: 'sl', startIn: 6, endIn: 24, partId: 'sleeve-3-4' }];
    },
  },
  {
    code: 'support-gap',
    source: 'common practice: a clamp every 18 in; 30 in unsupported',
    raises: (d) => (d.lines[0].supports = []),
  },
  {
    code: 'restriction',
    source: 'common practice: bore ≥ 80 % of the hose ID (0.2 in < 0.8 × 0.34 in)',
    raises: (d) => (d.lines[0].endStacks.from = ['adp-narrow', 'end-6-straight']),
  },
  {
    code: 'lube-path-valve',
    source: 'common practice: a stuck bypass valve starves the gear train',
    raises: withValve,
    quiet: (d) => {
      withValve(d);
      portOf(d, 'trans', 'ret').feedsLubrication = false;
    },
  },
  {
    code: 'open-port',
    source: 'a port without line or plug leaks',
    raises: (d) => d.units[0].ports.push({ id: 'spare', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'out', dx: 0, dy: 50 }),
    quiet: (d) =>
      d.units[0].ports.push({ id: 'spare', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'out', dx: 0, dy: 50, plugPartId: 'plug-orb6' }),
  },
  {
    code: 'flow-direction',
    source: 'transmission out → cooler out: two outlets',
    raises: (d) => (portOf(d, 'cooler', 'in').role = 'out'),
  },
  {
    code: 'port-reach',
    source: 'invented port: 0.6 in of usable thread; the adapter reaches 0.75 in',
    parts: [...extraParts, reach075],
    raises: (d) => {
      portOf(d, 'trans', 'out').threadDepthIn = 0.6;
      d.lines[0].endStacks.from = ['adp-reach-075', 'end-6-straight'];
    },
    quiet: (d) => {
      portOf(d, 'trans', 'out').threadDepthIn = 0.75;
      d.lines[0].endStacks.from = ['adp-reach-075', 'end-6-straight'];
    },
  },
  {
    code: 'no-slack',
    source: 'FAA AC 43.13-1B: hose may shorten 4 %; shop minimum 1-1/2 in',
    raises: (d) => (d.lines[0].slackOverrideIn = 0.5),
    quiet: (d) => (d.lines[0].slackOverrideIn = 2),
  },
  {
    code: 'scale-missing',
    source: 'no calibration and no measured length',
    raises: (d) => (d.calibration = null),
    quiet: (d) => {
      d.calibration = null;
      d.lines.forEach((l) => (l.measuredLengthIn = 31));
    },
  },
  {
    code: 'incomplete-line',
    source: 'a line without hose',
    raises: (d) => (d.lines[0].hosePartId = null),
  },
  {
    code: 'missing-part',
    source: 'a part id the catalogue does not hold',
    raises: (d) => (d.lines[0].endStacks.from = ['ghost', 'end-6-straight']),
  },
];

const codesOf = (edit: Edit | undefined, parts: Part[] = extraParts) =>
  evaluateCircuit(coolerCircuit(edit), parts, defaultShopRules).flags.map((f) => f.code);

describe('the rules', () => {
  it('the clean cooler circuit raises no flag', () => {
    expect(codesOf(undefined)).toEqual([]);
  });

  it('every registered rule has a case here, and every code is unique', () => {
    const codes = ruleRegistry.map((r) => r.code);
    expect(new Set(codes).size).toBe(codes.length);
    expect(cases.map((c) => c.code).sort()).toEqual([...codes].sort());
  });

  describe.each(cases)('$code', ({ code, source, raises, quiet, parts }) => {
    it(`raises it: ${source}`, () => {
      expect(codesOf(raises, parts)).toContain(code);
    });
    it('stays quiet on the near miss', () => {
      expect(codesOf(quiet, parts)).not.toContain(code);
    });
  });

  it('a transmission-cooler circuit with a short fitting in the port that feeds lubrication raises port-requirement on that joint', () => {
    const doc = coolerCircuit((d) => (d.lines[1].endStacks.to = ['adp-orb6-fl6', 'end-6-straight']));
    const flags = evaluateCircuit(doc, testParts, defaultShopRules).flags;
    expect(flags).toHaveLength(1);
    expect(flags[0]).toMatchObject({
      code: 'port-requirement',
      severity: 'blocker',
      target: { kind: 'joint', lineId: 'L2', end: 'to', index: 0 },
    });
    expect(flags[0].message).toContain('long-nose');
  });

  it('orders flags by severity, then target, whatever order the rules run in', () => {
    const doc = coolerCircuit((d) => {
      d.lines[0].supports = [];
      d.lines[1].supports = [];
      d.lines[1].endStacks.to = ['adp-orb6-fl6', 'end-6-straight'];
      d.circuit.fluid = 'e85';
    });
    const flags = evaluateCircuit(doc, testParts, defaultShopRules).flags;
    expect(flags.map((f) => `${f.severity}:${f.code}:${f.target.id}`)).toEqual([
      'blocker:fluid:L1',
      'blocker:fluid:L2',
      // The nitrile AS568-906 O-rings of the two O-ring boss joints (E85: common practice).
      'blocker:fluid:L1:from:0',
      'blocker:fluid:L2:to:0',
      'blocker:port-requirement:L2:to:0',
      'caution:support-gap:L1',
      'caution:support-gap:L2',
    ]);
  });

  it('every rule has a title and a plain-words description for the Reference page', () => {
    for (const rule of ruleRegistry) {
      expect(rule.title.length).toBeGreaterThan(3);
      expect(rule.description.length).toBeGreaterThan(40);
      expect(['blocker', 'caution', 'note']).toContain(rule.severity);
    }
  });
});
