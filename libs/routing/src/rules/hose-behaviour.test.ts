import type { HosePart, Part } from '@linesmith/catalog';
import { describe, expect, it } from 'vitest';
import type { CircuitDocumentInput } from '../circuit/document.schema.js';
import { evaluateCircuit } from '../evaluate/evaluate-circuit.js';
import { bendRadiusCheck } from '../lines/hose-fit.js';
import { coolerCircuit, hose6, hoseEnd6, orbToFlare6, orbToFlare6LongNose, orbPlug6, part, testParts } from '../test-support/fixtures.js';
import type { Flag } from './flag.js';
import { AC43_13_TABLE_9_3_ALUMINIUM_IN, defaultShopRules, migrateShopRules, shopRuleOrigins, shopRulesSchema, supportSpacingFor, type ShopRules } from './shop-rules.js';

// Cut and bend rules as hose behaves. Every scene is the test cooler circuit (10 px to the inch):
// transmission (powertrain) out → cooler in, cooler out → transmission return, -6 hose 0.69 in OD.

type Edit = (d: CircuitDocumentInput) => void;
const run = (edit: Edit, parts: Part[] = testParts, rules: ShopRules = defaultShopRules) =>
  evaluateCircuit(coolerCircuit(edit), parts, rules);
const flagsOf = (flags: Flag[], code: string, lineId?: string) =>
  flags.filter((f) => f.code === code && (lineId === undefined || f.target.lineId === lineId));
const portOf = (d: CircuitDocumentInput, unitId: string, portId: string) =>
  d.units.find((u) => u.id === unitId)!.ports.find((p) => p.id === portId)!;

describe('1. every line gets slack (FAA AC 43.13-1B, ch. 9: hose shortens up to 4 % under pressure)', () => {
  // Hose ends with a 1-1/2 in cut-off allowance: 1/2 in adapter + 1-1/2 in at the transmission, 1-1/2 in at the cooler = 3-1/2 in.
  const longEnd = part({ ...hoseEnd6, id: 'end-6-long', attributes: { ...hoseEnd6.attributes, allowanceIn: 1.5 } });
  const sameMount: Edit = (d) => {
    d.units[1].mountGroup = 'powertrain';
    d.lines[0].endStacks = { from: ['adp-orb6-fl6', 'end-6-long'], to: ['end-6-long'] };
  };

  it('both ports on the powertrain: a 30 in route is cut 30 − 3-1/2 + 4 % × 30 = 27.7 → 27-3/4 in, not pulled tight at 26-1/2 in', () => {
    const line = run(sameMount, [...testParts, longEnd]).lines[0];
    expect(line.crossesMounts).toBe(false);
    expect(line.centrelineIn).toBe(30);
    expect(line.endStackFromIn + line.endStackToIn).toBe(3.5);
    expect(line.slackIn).toBeCloseTo(1.2, 12); // 4 % × 30 in > the 1/2 in same-mount minimum (common practice)
    expect(line.slackRule).toBe('percent');
    expect(line.exactCutIn).toBeCloseTo(27.7, 12);
    expect(line.cutLengthIn).toBe(27.75);
  });

  it('a short line on one mount gets the 1/2 in same-mount minimum; across mounts the 1-1/2 in one (common practice)', () => {
    const close: Edit = (d) => {
      d.units[1].x = 100; // 10 in route
      d.units[1].mountGroup = 'powertrain';
    };
    const same = run(close).lines[0];
    expect(same.slackIn).toBe(0.5); // 4 % × 10 in = 0.4 in < 1/2 in
    expect(same.slackRule).toBe('same-mount-minimum');
    const across = run((d) => (d.units[1].x = 100)).lines[0];
    expect(across.slackIn).toBe(1.5);
    expect(across.slackRule).toBe('cross-mount-minimum');
  });

  it('an override below the need is a caution on a same-mount line too; the report says the override applied', () => {
    const result = run((d) => {
      sameMount(d);
      d.lines[0].slackOverrideIn = 0;
    }, [...testParts, longEnd]);
    expect(result.lines[0].slackRule).toBe('override');
    const [flag] = flagsOf(result.flags, 'no-slack', 'L1');
    expect(flag.severity).toBe('caution');
    expect(flag.message).toContain('0 in of slack; the shop asks for 1-3/16 in (4 % of the length)'); // 1.2 in to the nearest 1/16
  });
});

describe('2. bend radius on the inside of the bend (SAE J517 and hose makers’ data: "measured to the innermost surface")', () => {
  const hose25 = part({ ...hose6, id: 'hose-6-r25', attributes: { ...hose6.attributes, minBendRadiusIn: 2.5 } }) as HosePart;
  const centrelineHose = part({ ...hose25, id: 'hose-6-r25-cl', attributes: { ...hose25.attributes, minBendRadiusMeasuredTo: 'centreline' } });
  const bendAt = (hoseId: string, radiusIn: number): Edit => (d) => {
    d.lines[0].hosePartId = hoseId;
    d.lines[0].points = [{ x: 150, y: 150, bendRadiusIn: radiusIn }];
  };

  it('a 2.5 in centreline bend on a 0.69 in OD hose with a 2.5 in minimum has a 2.155 in inside radius: blocker, both numbers shown', () => {
    expect(bendRadiusCheck(2.5, hose25)).toMatchObject({ centrelineIn: 2.5, basis: 'inside', minIn: 2.5 });
    expect(bendRadiusCheck(2.5, hose25).insideIn).toBeCloseTo(2.155, 12);
    const [flag] = flagsOf(run(bendAt('hose-6-r25', 2.5), [...testParts, hose25]).flags, 'bend-radius');
    expect(flag.severity).toBe('blocker');
    expect(flag.message).toContain('inside radius is 2.155 in (centreline 2.5 in less half the 0.69 in hose OD)');
    expect(flag.message).toContain('needs at least 2.5 in, quoted to the inside of the bend');
    expect(flag.fix).toContain('2.845 in centreline radius'); // 2.5 + 0.69/2
  });

  it('opened up to 2.5 + 0.345 = 2.845 in centreline (inside exactly 2.5 in) it passes', () => {
    expect(flagsOf(run(bendAt('hose-6-r25', 2.845), [...testParts, hose25]).flags, 'bend-radius')).toEqual([]);
  });

  it('a hose whose maker quotes the centreline is compared on the centreline (the shop’s choice per hose)', () => {
    expect(flagsOf(run(bendAt('hose-6-r25-cl', 2.5), [...testParts, centrelineHose]).flags, 'bend-radius')).toEqual([]);
    const [flag] = flagsOf(run(bendAt('hose-6-r25-cl', 2.4), [...testParts, centrelineHose]).flags, 'bend-radius');
    expect(flag.message).toContain('centreline radius is 2.4 in (inside 2.055 in)');
  });
});

describe('3. no bend inside the fittings; a straight stretch past the socket (common practice: 2 × hose OD)', () => {
  // A -6 hose end whose socket holds the hose 1-1/4 in past its seal point: with the 1/2 in adapter, 1-3/4 in rigid.
  const socketEnd = part({ ...hoseEnd6, id: 'end-6-socket', attributes: { ...hoseEnd6.attributes, rigidLengthIn: 1.25 } });
  const parts = [...testParts, socketEnd];
  /** The cooler 30 in below a corner `cornerIn` from the transmission port; R 2.5 in, 90°. */
  const cornerAt = (cornerIn: number): Edit => (d) => {
    d.units[1].x = cornerIn * 10;
    d.units[1].y = 300;
    d.lines[0].points = [{ x: cornerIn * 10, y: 0, bendRadiusIn: 2.5 }];
    d.lines[0].endStacks = { from: ['adp-orb6-fl6', 'end-6-socket'], to: ['end-6-socket'] };
  };

  it('a corner 3 in from the port at R 2.5 starts bending 0.5 in from the port face, inside 1.75 in of adapter + socket: blocker', () => {
    const flags = flagsOf(run(cornerAt(3), parts).flags, 'bend-radius', 'L1');
    expect(flags).toHaveLength(1);
    expect(flags[0].severity).toBe('blocker');
    expect(flags[0].target).toMatchObject({ end: 'from', index: 0 });
    expect(flags[0].message).toContain('starts bending 1/2 in from the port face');
    expect(flags[0].message).toContain('inside the 1-3/4 in of rigid fitting there (adapters 1/2 in + hose end 1-1/4 in)');
    // Rigid 1.75 + 2 × 0.69 = 3.13 in → 3-1/8 in to the nearest 1/16.
    expect(flags[0].fix).toContain('at least 3-1/8 in from the port');
  });

  it('past the socket but within 2 × 0.69 = 1.38 in of it: a caution; further out: nothing', () => {
    // Corner 5 in out: the bend starts 2.5 in from the face, 0.75 in past the 1.75 in rigid length.
    const near = run(cornerAt(5), parts).flags;
    expect(flagsOf(near, 'bend-radius', 'L1')).toEqual([]);
    const [flag] = flagsOf(near, 'bend-near-socket', 'L1');
    expect(flag.severity).toBe('caution');
    expect(flag.message).toContain('3/4 in past the socket');
    expect(flag.message).toContain('1-3/8 in of straight hose there (2 × the 11/16 in OD)');
    // Corner 5.63 in out: the bend starts at 3.13 in = 1.75 + 1.38, exactly the shop's stretch.
    expect(flagsOf(run(cornerAt(5.63), parts).flags, 'bend-near-socket', 'L1')).toEqual([]);
  });

  it('the straight stretch is the shop’s rule, with its origin', () => {
    expect(defaultShopRules.straightAfterSocketOd).toBe(2);
    expect(shopRuleOrigins.straightAfterSocketOd).toMatch(/^Common practice/);
    const none = shopRulesSchema.parse({ straightAfterSocketOd: 0 });
    expect(flagsOf(run(cornerAt(5), parts, none).flags, 'bend-near-socket')).toEqual([]);
  });
});

describe('4. minimum free hose (common practice: 2 in) and measured against drawn', () => {
  it('cuts of 1 in and 1/4 in leave 1 in and 1/4 in of free hose between the sockets: cautions with the numbers', () => {
    // Cut = measured − (1/2 + 3/4) − 3/4 + 1-1/2 slack; free hose = measured + slack − both rigid lengths (no socket lengths given).
    for (const [measuredIn, cutIn] of [
      [1.5, 1],
      [0.75, 0.25],
    ]) {
      const result = run((d) => (d.lines[0].measuredLengthIn = measuredIn));
      expect(result.lines[0].cutLengthIn).toBe(cutIn);
      const [flag] = flagsOf(result.flags, 'free-hose-length', 'L1');
      expect(flag.severity).toBe('caution');
      expect(flag.message).toContain(`Only ${cutIn === 1 ? '1' : '1/4'} in of free hose`);
      expect(flag.message).toContain('at least 2 in');
    }
  });

  it('fittings that meet leave no hose: blocker', () => {
    const [flag] = flagsOf(run((d) => (d.lines[0].measuredLengthIn = 0.4)).flags, 'free-hose-length', 'L1');
    expect(flag.severity).toBe('blocker');
  });

  it('a measured 3 in against a drawn 30 in is a caution naming both', () => {
    const [flag] = flagsOf(run((d) => (d.lines[0].measuredLengthIn = 3)).flags, 'measured-length', 'L1');
    expect(flag.severity).toBe('caution');
    expect(flag.message).toContain('measured 3 in is shorter than the 30 in straight between the ports');
    // 20 % allowance for perspective (common practice): 24 in passes, 23.9 in does not.
    expect(flagsOf(run((d) => (d.lines[0].measuredLengthIn = 24)).flags, 'measured-length')).toEqual([]);
    expect(flagsOf(run((d) => (d.lines[0].measuredLengthIn = 23.9)).flags, 'measured-length')).toHaveLength(1);
  });

  it('a measured 300 in against a drawn 30 in is a note (typed in the wrong unit?)', () => {
    const [flag] = flagsOf(run((d) => (d.lines[0].measuredLengthIn = 300)).flags, 'measured-length', 'L1');
    expect(flag.severity).toBe('note');
  });
});

describe('5. clamp spacing by dash size, FAA AC 43.13-1B Table 9-3 (aluminium-alloy tubing column, values from memory)', () => {
  it('seeds the table by tube OD: -3 (3/16 in) 12 in … -16 (1 in) 26-1/2 in, growing with size', () => {
    expect(defaultShopRules.supportSpacingByDashIn).toEqual({ '2': 9.5, '3': 12, '4': 13.5, '5': 15, '6': 16.5, '8': 19, '10': 22, '12': 24, '16': 26.5 });
    expect(supportSpacingFor(3, defaultShopRules)).toBe(12);
    expect(supportSpacingFor(16, defaultShopRules)).toBe(26.5);
    const values = Object.entries(AC43_13_TABLE_9_3_ALUMINIUM_IN).sort(([a], [b]) => Number(a) - Number(b)).map(([, v]) => v);
    expect(values).toEqual([...values].sort((a, b) => a - b));
    // A size the table does not list takes the shop's general spacing (18 in, common practice).
    expect(supportSpacingFor(20, defaultShopRules)).toBe(18);
    expect(shopRuleOrigins.supportSpacingByDashIn).toMatch(/FAA AC 43\.13-1B, Table 9-3/);
  });

  it('a -6 line with a 17 in span is a caution (16-1/2 in); a -8 hose on the same span is not (19 in); the table is editable', () => {
    const hose8 = part({ ...hose6, id: 'hose-8', attributes: { ...hose6.attributes, dash: 8 } });
    const span17: Edit = (d) => (d.lines[0].supports = [{ id: 's1', atIn: 13 }]); // spans 13 and 17 in
    const [flag] = flagsOf(run(span17).flags, 'support-gap', 'L1');
    expect(flag.message).toContain('longer than 16-1/2 in (the shop’s spacing for -6)');
    expect(run(span17).lines[0].supports.proposedAtIn).toEqual([15]); // 30 in in two spans of 15 ≤ 16-1/2 in
    expect(flagsOf(run((d) => (span17(d), (d.lines[0].hosePartId = 'hose-8')), [...testParts, hose8]).flags, 'support-gap', 'L1')).toEqual([]);
    const edited = shopRulesSchema.parse({ supportSpacingByDashIn: { ...AC43_13_TABLE_9_3_ALUMINIUM_IN, '6': 18 } });
    expect(flagsOf(run(span17, testParts, edited).flags, 'support-gap', 'L1')).toEqual([]);
  });

  it('old stored rules still read: a uniform spacing the shop had chosen fills the table; the old 18 in default seeds it', () => {
    expect(migrateShopRules({ supportSpacingIn: 24, slackMinIn: 2 }).supportSpacingByDashIn['6']).toBe(24);
    expect(migrateShopRules({ supportSpacingIn: 18 }).supportSpacingByDashIn).toEqual(AC43_13_TABLE_9_3_ALUMINIUM_IN);
    const old = migrateShopRules({ slackMinIn: 2 });
    expect(old.slackMinIn).toBe(2);
    expect(old.slackMinSameMountIn).toBe(0.5);
  });
});

describe('6. a shielded heat zone turns contact into a caution, clearance still reported', () => {
  // An exhaust 4 in square across line L1 at 13…17 in; clearance 6 in (common practice).
  const exhaust = (shielded: boolean): Edit => (d) => {
    d.heatZones = [
      { id: 'hz', label: 'Downpipe', kind: 'exhaust', shielded, polygon: [{ x: 130, y: -20 }, { x: 170, y: -20 }, { x: 170, y: 20 }, { x: 130, y: 20 }] },
    ];
  };

  it('unshielded: blocker; shielded: caution for the reviewer, with 16 in within the 6 in clearance (7 … 23 in)', () => {
    const [bare] = flagsOf(run(exhaust(false)).flags, 'heat-contact', 'L1');
    expect(bare.severity).toBe('blocker');
    const result = run(exhaust(true));
    const [shielded] = flagsOf(result.flags, 'heat-contact', 'L1');
    expect(shielded.severity).toBe('caution');
    expect(shielded.message).toContain('marked as shielded');
    expect(shielded.message).toContain('16 in of the route lies within the 6 in clearance (7–23 in from the from end)');
    // The stretch still needs a sleeve.
    expect(flagsOf(result.flags, 'heat-sleeve', 'L1')).toHaveLength(1);
  });
});

describe('7. port roles and flow direction', () => {
  it('transmission out → cooler outlet: two outlets, a caution', () => {
    const result = run((d) => (d.lines[0].to = { unitId: 'cooler', portId: 'out' }) && (d.lines[1].from = { unitId: 'cooler', portId: 'in' }));
    const flags = flagsOf(result.flags, 'flow-direction');
    expect(flags.map((f) => f.target.lineId).sort()).toEqual(['L1', 'L2']);
    expect(flags.find((f) => f.target.lineId === 'L1')!.message).toContain('both send fluid out');
    // …and cooler inlet → transmission return: two inlets.
    expect(flags.find((f) => f.target.lineId === 'L2')!.message).toContain('both take fluid in');
  });

  it('a return port fed from a unit that never took fluid from its own unit', () => {
    const result = run((d) => {
      d.units.push({
        id: 'aux',
        kind: 'cooler',
        label: 'Aux cooler',
        x: 300,
        y: 600,
        mountGroup: 'chassis',
        ports: [{ id: 'out', connection: { family: 'flare37', size: '-6', gender: 'male' }, role: 'out', dx: 0, dy: 0 }],
      });
      d.lines[1].from = { unitId: 'aux', portId: 'out' };
    });
    const [flag] = flagsOf(result.flags, 'flow-direction', 'L2');
    expect(flag.message).toContain('takes fluid from Aux cooler, which no other line links back to Transmission');
    expect(flagsOf(run(() => {}).flags, 'flow-direction')).toEqual([]);
  });

  it('a vent left open is a note; any other open port a caution', () => {
    const spare = (role: 'vent' | 'out'): Edit => (d) =>
      d.units[0].ports.push({ id: 'spare', connection: { family: 'orb', size: '-6', gender: 'female' }, role, dx: 0, dy: 50 });
    expect(flagsOf(run(spare('vent')).flags, 'open-port')[0].severity).toBe('note');
    expect(flagsOf(run(spare('out')).flags, 'open-port')[0].severity).toBe('caution');
  });
});

describe('8. port thread depth and passage depth against the fitting’s reach (invented port and parts)', () => {
  const withReach = (id: string, base: Part, reachIn: number) =>
    part({ ...base, id, attributes: { ...(base.attributes as object), reachIn } });
  const short = withReach('adp-short-050', orbToFlare6, 0.5);
  const longNose = withReach('adp-ln-110', orbToFlare6LongNose, 1.1);
  const plug = withReach('plug-075', orbPlug6, 0.75);
  const parts = [...testParts, short, longNose, plug];
  const inReturn = (adapterId: string, limits: { threadDepthIn?: number; passageDepthIn?: number; minReachIn?: number }): Edit => (d) => {
    Object.assign(portOf(d, 'trans', 'ret'), limits);
    d.lines[1].endStacks.to = [adapterId, 'end-6-straight'];
  };

  it('too long: a 1.1 in reach bottoms in 0.9 in of thread and blocks a passage 1 in in', () => {
    const flags = flagsOf(run(inReturn('adp-ln-110', { threadDepthIn: 0.9, passageDepthIn: 1 }), parts).flags, 'port-reach');
    expect(flags.map((f) => f.severity)).toEqual(['blocker', 'blocker']);
    expect(flags.map((f) => f.message).join(' ')).toContain('reaches 1-1/8 in into the port at Transmission cooler return, past its 7/8 in of usable thread');
    expect(flags.map((f) => f.message).join(' ')).toContain('the internal passage behind it starts 1 in in');
    expect(flags[0].target).toMatchObject({ kind: 'joint', lineId: 'L2', end: 'to', index: 0 });
  });

  it('too short: the return needs 1 in of reach (the long-nose fitting); a 1/2 in reach is a blocker naming both', () => {
    const short1 = flagsOf(run(inReturn('adp-short-050', { minReachIn: 1 }), parts).flags, 'port-reach');
    expect(short1).toHaveLength(1);
    expect(short1[0].message).toContain('reaches only 1/2 in into the port at Transmission cooler return, which needs at least 1 in');
    expect(short1[0].fix).toContain('long-nose');
    expect(flagsOf(run(inReturn('adp-ln-110', { minReachIn: 1, threadDepthIn: 1.25 }), parts).flags, 'port-reach')).toEqual([]);
  });

  it('a part without a reach is a note, not a silent pass; a plug is checked too', () => {
    const [note] = flagsOf(run(inReturn('adp-orb6-fl6-ln', { minReachIn: 1 }), parts).flags, 'port-reach');
    expect(note.severity).toBe('note');
    const plugged = run((d) => {
      d.units[0].ports.push({ id: 'spare', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'out', dx: 0, dy: 50, plugPartId: 'plug-075', threadDepthIn: 0.5 });
    }, parts);
    expect(flagsOf(plugged.flags, 'port-reach')[0].message).toContain('reaches 3/4 in');
  });
});

describe('9. thresholds compared with a tolerance', () => {
  const hose375 = part({ ...hose6, id: 'hose-6-375', attributes: { ...hose6.attributes, idIn: 0.375 } });
  const endBore = (boreIn: number) => part({ ...hoseEnd6, id: `end-bore-${boreIn}`, attributes: { ...hoseEnd6.attributes, boreIn } });

  it('0.8 × 0.375 = 0.30000000000000004 in float; a 0.300 in bore meets the 80 % ratio (common practice), 0.299 in does not', () => {
    expect(0.8 * 0.375).toBeGreaterThan(0.3); // the float noise the rule must not flag
    const atLimit = endBore(0.3);
    const under = endBore(0.299);
    const withEnd = (id: string): Edit => (d) => {
      d.lines[0].hosePartId = 'hose-6-375';
      d.lines[0].endStacks.to = [id];
    };
    const parts = [...testParts, hose375, atLimit, under];
    expect(flagsOf(run(withEnd(atLimit.id), parts).flags, 'restriction', 'L1')).toEqual([]);
    expect(flagsOf(run(withEnd(under.id), parts).flags, 'restriction', 'L1')).toHaveLength(1);
  });
});

describe('10. valve wording: a thermostatic bypass normally passes flow; say what fails and when', () => {
  it('names the uncooled and the blocked failure, and never says it starves the path by being there', () => {
    const result = run((d) => {
      d.units.push({
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
      const l2 = d.lines[1];
      d.lines.push({ ...structuredClone(l2), id: 'L3', from: { unitId: 'valve', portId: 'out' } });
      l2.to = { unitId: 'valve', portId: 'in' };
      l2.endStacks = { from: ['end-6-straight'], to: ['end-6-straight'] };
    });
    const [flag] = flagsOf(result.flags, 'lube-path-valve');
    expect(flag.message).toContain('normally passes flow');
    expect(flag.message).toContain('sticks in bypass the fluid reaching Transmission cooler return goes uncooled');
    expect(flag.message).toContain('blocks the cooler path');
    expect(flag.message).not.toMatch(/starves/);
  });
});
