import { describe, expect, it } from 'vitest';
import { portRequirementSchema as catalogueRequirementSchema, type Part } from '@linesmith/catalog';
import { circuitDocumentSchema, type CircuitDocumentInput } from '../circuit/document.schema.js';
import { evaluateCircuit } from '../evaluate/evaluate-circuit.js';
import { coolerCircuit, coolerCircuitInput, orbToFlare6, orbToFlare6LongNose, oring906, orbPlug6, part, testParts } from '../test-support/fixtures.js';
import type { Flag } from './flag.js';
import { defaultShopRules, shopRulesSchema } from './shop-rules.js';

/** Cases where a wrong line used to pass without a flag: each must raise now, and its near miss stay quiet. */

type Edit = (doc: CircuitDocumentInput) => void;
const unratedAdapter = part({ ...orbToFlare6, id: 'adp-unrated', attributes: { ...orbToFlare6.attributes, maxPressurePsi: undefined } });
const lowRatedAdapter = part({ ...orbToFlare6, id: 'adp-100psi', attributes: { ...orbToFlare6.attributes, maxPressurePsi: 100 } });
const unratedPlug = part({ ...orbPlug6, id: 'plug-unrated', attributes: { connection: { family: 'orb', size: '-6', gender: 'male' } } });
const orbPlug8 = part({ ...orbPlug6, id: 'plug-orb8', description: '-8 O-ring boss plug', attributes: { connection: { family: 'orb', size: '-8', gender: 'male' }, maxPressurePsi: 3000 } });
const narrowSleeve = part({ id: 'sleeve-1-2', kind: 'sleeve', description: 'Fire sleeve 1/2', attributes: { fitsOd: { minIn: 0.3, maxIn: 0.5 }, maxTempF: 500 } });
const parts: Part[] = [...testParts, unratedAdapter, lowRatedAdapter, unratedPlug, orbPlug8, narrowSleeve];

const flagsOf = (edit: Edit): Flag[] => evaluateCircuit(coolerCircuit(edit), parts, defaultShopRules).flags;
const withCode = (edit: Edit, code: string) => flagsOf(edit).filter((f) => f.code === code);

const square = (cx: number, cy: number, half: number) => [
  { x: cx - half, y: cy - half },
  { x: cx + half, y: cy - half },
  { x: cx + half, y: cy + half },
  { x: cx - half, y: cy + half },
];
/** An exhaust zone 2 in beside L1 (10 px/in): inside the 6 in clearance, no contact. */
const exhaustBesideL1: Edit = (d) => (d.heatZones = [{ id: 'hz', kind: 'exhaust', polygon: square(150, 40, 20) }]);
const spare = (extra: object = {}) => ({
  id: 'spare',
  connection: { family: 'orb' as const, size: '-6', gender: 'female' as const },
  role: 'vent' as const,
  dx: 0,
  dy: 50,
  ...extra,
});
const measuredEverywhere: Edit = (d) => {
  d.calibration = null;
  d.lines.forEach((l) => (l.measuredLengthIn = 31));
};

describe('scale-missing: the checks a missing scale switches off (DOMAIN.md §4: Scale, Heat, bend radius)', () => {
  it('raises a blocker naming the heat check when there are heat zones, even with every length measured', () => {
    const flags = withCode((d) => {
      measuredEverywhere(d);
      exhaustBesideL1(d);
    }, 'scale-missing');
    expect(flags).toHaveLength(1);
    expect(flags[0].severity).toBe('blocker');
    expect(flags[0].message).toContain('heat check could not run');
    expect(flags[0].message).not.toContain('no length');
  });

  it('raises a blocker naming the bend check when a line has a radiused corner', () => {
    const flags = withCode((d) => {
      measuredEverywhere(d);
      d.lines[0].points = [{ x: 150, y: 100, bendRadiusIn: 3 }];
    }, 'scale-missing');
    expect(flags).toHaveLength(1);
    expect(flags[0].message).toContain('bend check could not run on the corners of L1');
  });

  it('stays quiet with every length measured, no heat zone and straight lines', () => {
    expect(withCode(measuredEverywhere, 'scale-missing')).toEqual([]);
  });

  it('stays quiet once calibrated: the heat check runs and raises its own caution', () => {
    const codes = flagsOf(exhaustBesideL1).map((f) => f.code);
    expect(codes).not.toContain('scale-missing');
    expect(codes).toContain('heat-sleeve');
  });
});

describe('open-port: a plug that does not close the port is a blocker (SAE J1926-1: -6 is 9/16-18, -8 is 3/4-16 UNF)', () => {
  it.each([
    ['a part the catalogue does not hold', 'ghost-plug', 'not in the catalogue'],
    ['an adapter named as the plug', orbToFlare6.id, 'not a plug'],
    ['a -8 plug in a -6 port', orbPlug8.id, 'does not fit'],
  ])('raises on %s', (_, plugPartId, words) => {
    const flags = withCode((d) => d.units[0].ports.push(spare({ plugPartId })), 'open-port');
    expect(flags).toHaveLength(1);
    expect(flags[0]).toMatchObject({ severity: 'blocker', target: { kind: 'port', id: 'spare', unitId: 'trans' } });
    expect(flags[0].message).toContain(words);
  });

  it('stays quiet with a -6 O-ring boss plug in the -6 port', () => {
    expect(withCode((d) => d.units[0].ports.push(spare({ plugPartId: orbPlug6.id })), 'open-port')).toEqual([]);
  });
});

describe('heat-sleeve: only a sleeve part that fits the hose OD covers the hot stretch (DOMAIN.md §4 Heat; common practice)', () => {
  const sleeveOn = (partId: string | null): Edit => (d) => {
    exhaustBesideL1(d);
    d.lines[0].sleeves = [{ id: 'sl', startIn: 6, endIn: 24, partId }];
  };

  it.each([
    ['no part', null, 'has no sleeve part'],
    ['a clamp as the part', 'clamp-11-16', 'not a sleeve'],
    ['a sleeve for 0.3–0.5 in OD on a 0.69 in hose', narrowSleeve.id, 'another hose size'],
  ])('raises a caution for a sleeve with %s and says to pick a sleeve part', (_, partId, words) => {
    const flags = withCode(sleeveOn(partId), 'heat-sleeve');
    expect(flags).toHaveLength(1);
    expect(flags[0].severity).toBe('caution');
    expect(flags[0].message).toContain('Unsleeved near heat');
    expect(flags[0].message).toContain(words);
    expect(flags[0].fix).toContain('Pick a sleeve part');
    const report = evaluateCircuit(coolerCircuit(sleeveOn(partId)), parts, defaultShopRules).lines[0];
    expect(report.sleeves.uncoveredIn.length).toBeGreaterThan(0);
  });

  it('stays quiet with a 0.5–0.8 in sleeve over the stretch of a 0.69 in hose', () => {
    expect(withCode(sleeveOn('sleeve-3-4'), 'heat-sleeve')).toEqual([]);
  });

  it('rating-temperature reads the sleeve part: 200 °F sleeve on a 250 °F circuit raises, 500 °F does not', () => {
    const cool = part({ ...narrowSleeve, id: 'sleeve-cool', attributes: { fitsOd: { minIn: 0.5, maxIn: 0.8 }, maxTempF: 200 } });
    const run = (id: string) =>
      evaluateCircuit(coolerCircuit(sleeveOn(id)), [...parts, cool], defaultShopRules).flags.filter((f) => f.code === 'rating-temperature');
    expect(run('sleeve-cool')).toHaveLength(1);
    expect(run('sleeve-3-4')).toEqual([]);
  });
});

describe('rating-pressure: an unrated fitting or plug is noted, never passed silently', () => {
  it('notes an adapter without a rating', () => {
    const flags = withCode((d) => (d.lines[0].endStacks.from = [unratedAdapter.id, 'end-6-straight']), 'rating-pressure');
    expect(flags).toHaveLength(1);
    expect(flags[0].severity).toBe('note');
    expect(flags[0].message).toContain('rating unknown — check the maker’s rating');
  });

  it('notes an unrated plug in an unused port', () => {
    const flags = withCode((d) => d.units[0].ports.push(spare({ plugPartId: unratedPlug.id })), 'rating-pressure');
    expect(flags).toHaveLength(1);
    expect(flags[0]).toMatchObject({ severity: 'note', target: { kind: 'port', id: 'spare' } });
  });

  it('blocks an adapter rated 100 psi on a 150 psi circuit', () => {
    const flags = withCode((d) => (d.lines[0].endStacks.from = [lowRatedAdapter.id, 'end-6-straight']), 'rating-pressure');
    expect(flags.map((f) => f.severity)).toEqual(['blocker']);
  });

  it('stays quiet with rated adapters and plug', () => {
    expect(withCode((d) => d.units[0].ports.push(spare({ plugPartId: orbPlug6.id })), 'rating-pressure')).toEqual([]);
  });
});

describe('port-requirement: the part in the port, seals aside, and plugged ports (common practice: long-nose in a lubrication-feed return)', () => {
  it('stays quiet when the O-ring is listed before the long-nose fitting', () => {
    expect(withCode((d) => (d.lines[1].endStacks.to = [oring906.id, orbToFlare6LongNose.id, 'end-6-straight']), 'port-requirement')).toEqual([]);
  });

  it('raises when the O-ring is listed before a short fitting, on that fitting’s joint', () => {
    const flags = withCode((d) => (d.lines[1].endStacks.to = [oring906.id, orbToFlare6.id, 'end-6-straight']), 'port-requirement');
    expect(flags).toHaveLength(1);
    expect(flags[0].target).toMatchObject({ kind: 'joint', lineId: 'L2', end: 'to', index: 1 });
  });

  it('raises on a plugged port that has a requirement', () => {
    const requirement = { feature: 'long-nose', reason: 'this port feeds the gear train lubrication' };
    const flags = withCode((d) => d.units[0].ports.push(spare({ plugPartId: orbPlug6.id, requirement })), 'port-requirement');
    expect(flags).toHaveLength(1);
    expect(flags[0].target).toMatchObject({ kind: 'joint', id: 'trans/spare:plug' });
  });
});

describe('one place for each fact', () => {
  it('a saved port requirement still parses, and is the catalogue requirement plus its reason', () => {
    const input = coolerCircuitInput();
    const parsed = circuitDocumentSchema.parse(JSON.parse(JSON.stringify(input)));
    const requirement = parsed.units[0].ports[1].requirement;
    expect(requirement).toEqual({ feature: 'long-nose', reason: 'this return also feeds the gear train lubrication' });
    expect(catalogueRequirementSchema.parse(requirement)).toEqual({ feature: 'long-nose' });
  });

  it('cut rounding accepts 1/16, 1/8, 1/4 and 1/2 in only (common practice)', () => {
    for (const step of [0.0625, 0.125, 0.25, 0.5]) expect(shopRulesSchema.parse({ cutRoundingIn: step }).cutRoundingIn).toBe(step);
    for (const step of [0.1, 0.3, 1, 0]) expect(shopRulesSchema.safeParse({ cutRoundingIn: step }).success).toBe(false);
  });
});
