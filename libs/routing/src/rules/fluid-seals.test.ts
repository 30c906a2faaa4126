import { describe, expect, it } from 'vitest';
import type { Part } from '@linesmith/catalog';
import { evaluateCircuit } from '../evaluate/evaluate-circuit.js';
import { coolerCircuit, hose6, hoseEnd6, oring906, orbToFlare6, part, testParts } from '../test-support/fixtures.js';
import { defaultShopRules } from './shop-rules.js';

// Seal compounds against fluids: common practice (elastomer compatibility charts), from memory.
// Hose classes: SAE J1532 Type A 250 psi, 125/150/165 °C classes (DOMAIN.md §1).

const ptfeHose = part({ ...hose6, id: 'hose-6-ptfe', attributes: { ...hose6.attributes, liner: 'ptfe', fluids: ['atf', 'engine-oil', 'gasoline', 'e85', 'diesel', 'power-steering'] } });
const fkm906 = part({ ...oring906, id: 'oring-906-fkm', description: 'O-ring AS568-906', attributes: { seal: { type: 'o-ring', as568: '906' }, compound: 'fluorocarbon', hardnessShoreA: 90 } });
const unknown906 = part({ ...oring906, id: 'oring-906-unknown', attributes: { seal: { type: 'o-ring', as568: '906' } } });

/** The cooler circuit as an E85 circuit on PTFE hose, so only the seals are in question. */
const e85 = (parts: Part[], edit?: Parameters<typeof coolerCircuit>[0]) =>
  evaluateCircuit(
    coolerCircuit((d) => {
      d.circuit.fluid = 'e85';
      d.circuit.maxTempF = 150;
      for (const line of d.lines) line.hosePartId = 'hose-6-ptfe';
      edit?.(d);
    }),
    parts,
    defaultShopRules,
  );
const fluidFlags = (result: ReturnType<typeof evaluateCircuit>) => result.flags.filter((f) => f.code === 'fluid');

describe('fluid rule: seals by compound', () => {
  it('an E85 circuit whose only AS568-906 O-ring is nitrile gets a blocker naming the seal and the compound to use', () => {
    const flags = fluidFlags(e85([...testParts, ptfeHose]));
    expect(flags.length).toBeGreaterThan(0);
    for (const flag of flags) {
      expect(flag.severity).toBe('blocker');
      expect(flag.message).toMatch(/AS568-906/);
      expect(flag.message).toMatch(/nitrile is not compatible with e85/);
      expect(flag.fix).toMatch(/fluorocarbon/);
      expect(flag.target.kind).toBe('joint');
    }
  });

  it('with a fluorocarbon AS568-906 in the catalogue as well, the seal check passes and the bill takes the fluorocarbon one, naming it', () => {
    const result = e85([...testParts, ptfeHose, fkm906]);
    expect(fluidFlags(result)).toEqual([]);
    const seal = result.bom.rows.find((r) => r.kind === 'seal');
    expect(seal?.partId).toBe('oring-906-fkm');
    expect(seal?.description).toBe('O-ring AS568-906 (90 Shore A fluorocarbon)');
  });

  it('on ATF the bill keeps the nitrile O-ring (first suitable in catalogue order)', () => {
    const result = evaluateCircuit(coolerCircuit(), [...testParts, fkm906], defaultShopRules);
    expect(result.bom.rows.find((r) => r.kind === 'seal')?.partId).toBe('oring-906');
  });

  it('picks between equally suitable seals by the usual compound for the fluid, whatever the catalogue order', () => {
    // Both suit ATF at 250 °F; nitrile is the usual choice for ATF, listed first or last.
    const reversed = evaluateCircuit(coolerCircuit(), [fkm906, ...testParts], defaultShopRules);
    expect(reversed.bom.rows.find((r) => r.kind === 'seal')?.partId).toBe('oring-906');
    // On E85 only the fluorocarbon one suits, wherever it is listed.
    expect(e85([fkm906, ...testParts, ptfeHose]).bom.rows.find((r) => r.kind === 'seal')?.partId).toBe('oring-906-fkm');
  });

  it('a seal the catalogue lacks is listed with the compound to buy for the fluid', () => {
    const result = e85(
      [...testParts.filter((p) => p.id !== 'oring-906'), ptfeHose],
    );
    expect(result.bom.rows.find((r) => r.kind === 'seal')?.description).toBe('O-ring AS568-906, fluorocarbon (not in the catalogue)');
  });

  it('a nitrile O-ring listed in the end stack itself is a blocker at its place in the stack', () => {
    const flags = fluidFlags(e85([...testParts, ptfeHose, fkm906], (d) => (d.lines[0].endStacks.from = ['oring-906', 'adp-orb6-fl6', 'end-6-straight'])));
    expect(flags.map((f) => f.target.id)).toContain('L1:from:0');
    expect(flags.find((f) => f.target.id === 'L1:from:0')?.message).toMatch(/nitrile/);
  });

  it('an adapter with a fitted nitrile O-ring is a blocker on E85', () => {
    const fitted = part({ ...orbToFlare6, id: 'adp-fitted-nbr', attributes: { ...orbToFlare6.attributes, sealCompound: 'nitrile' } });
    const flags = fluidFlags(e85([...testParts, ptfeHose, fkm906, fitted], (d) => (d.lines[0].endStacks.from = ['adp-fitted-nbr', 'end-6-straight'])));
    expect(flags.some((f) => /fitted to/.test(f.message) && /nitrile/.test(f.message))).toBe(true);
  });

  it('the same nitrile O-ring is fine on ATF (nitrile rated for ATF), so no seal flag', () => {
    const result = evaluateCircuit(coolerCircuit(), testParts, defaultShopRules);
    expect(fluidFlags(result)).toEqual([]);
  });

  it('nitrile is too hot above about 250 °F on ATF (common practice): blocker naming the temperature', () => {
    const hotHose = part({ ...hose6, attributes: { ...hose6.attributes, maxTempF: 350 } });
    const parts = testParts.map((p) => (p.id === 'hose-6' ? hotHose : p));
    const flags = fluidFlags(evaluateCircuit(coolerCircuit((d) => (d.circuit.maxTempF = 280)), parts, defaultShopRules));
    expect(flags.some((f) => /250 °F/.test(f.message))).toBe(true);
  });

  it('a seal part that does not state its compound is a caution, not a pass', () => {
    const parts = testParts.map((p) => (p.id === 'oring-906' ? unknown906 : p));
    const flags = fluidFlags(e85([...parts, ptfeHose]));
    expect(flags.length).toBeGreaterThan(0);
    expect(flags.every((f) => f.severity === 'caution' && /does not say its compound/.test(f.message))).toBe(true);
  });
});

describe('fluid rule: hose classes', () => {
  const j1532 = part({
    ...hose6,
    id: 'hose-6-j1532',
    attributes: { ...hose6.attributes, hoseClass: 'sae-j1532-150', maxPressurePsi: 250, maxTempF: 302, fluids: ['atf', 'gasoline'] },
  });
  const withCooler = (edit: Parameters<typeof coolerCircuit>[0]) =>
    fluidFlags(
      evaluateCircuit(
        coolerCircuit((d) => {
          for (const line of d.lines) line.hosePartId = 'hose-6-j1532';
          edit?.(d);
        }),
        [...testParts, j1532],
        defaultShopRules,
      ),
    );

  it('SAE J1532 cooler hose carrying gasoline is a blocker even when the part lists gasoline (the class is written for transmission oil)', () => {
    const flags = withCooler((d) => (d.circuit.fluid = 'gasoline'));
    expect(flags.some((f) => /SAE J1532/.test(f.message) && /not gasoline/.test(f.message))).toBe(true);
  });

  it('the 150 °C (302 °F) class is too cool for a 320 °F circuit, fine at 250 °F', () => {
    expect(withCooler((d) => (d.circuit.maxTempF = 320)).some((f) => /302 °F/.test(f.message))).toBe(true);
    expect(withCooler((d) => (d.circuit.maxTempF = 250))).toEqual([]);
  });
});

describe('seals by seat form and banjo washers in the bill of materials', () => {
  const banjoEnd = part({
    ...hoseEnd6,
    id: 'end-6-banjo',
    attributes: { ...hoseEnd6.attributes, port: { family: 'banjo', size: 'M14x1.5', gender: 'male' }, angle: 90 },
  });
  const crush = part({ id: 'crush-m14', kind: 'seal', description: 'Crush washer M14', attributes: { seal: { type: 'crush-washer', size: 'M14' }, compound: 'copper' } });
  const washerStud = part({
    ...orbToFlare6,
    id: 'adp-m14w',
    attributes: { ...orbToFlare6.attributes, a: { family: 'metric', size: 'M14x1.5', gender: 'male', seat: 'bonded-washer' }, seal: { type: 'bonded-washer', size: 'M14' } },
  });
  const edgeStud = part({
    ...orbToFlare6,
    id: 'adp-m14e',
    attributes: { ...orbToFlare6.attributes, a: { family: 'metric', size: 'M14x1.5', gender: 'male', seat: 'sealing-edge' }, seal: undefined },
  });
  const parts = [...testParts, banjoEnd, crush, washerStud, edgeStud];

  it('a banjo joint takes two crush washers (one each side of the eye; common practice)', () => {
    const { bom, flags } = evaluateCircuit(
      coolerCircuit((d) => {
        d.units[0].ports[0].connection = { family: 'banjo', size: 'M14x1.5', gender: 'female' };
        d.lines[0].endStacks.from = ['end-6-banjo'];
      }),
      parts,
      defaultShopRules,
    );
    expect(flags.filter((f) => f.code.startsWith('joint-'))).toEqual([]);
    expect(bom.rows.find((r) => r.partId === 'crush-m14')?.quantity).toBe(2);
  });

  it('an ISO 9974-1 port takes a bonded washer with a washer stud and none with a sealing-edge stud', () => {
    const port = (d: Parameters<NonNullable<Parameters<typeof coolerCircuit>[0]>>[0]) =>
      (d.units[0].ports[0].connection = { family: 'metric', size: 'M14x1.5', gender: 'female', seat: 'bonded-washer' });
    const washer = evaluateCircuit(coolerCircuit((d) => (port(d), (d.lines[0].endStacks.from = ['adp-m14w', 'end-6-straight']))), parts, defaultShopRules);
    expect(washer.bom.rows.find((r) => r.kind === 'seal' && /Bonded washer M14/.test(r.description))?.quantity).toBe(1);
    const edge = evaluateCircuit(coolerCircuit((d) => (port(d), (d.lines[0].endStacks.from = ['adp-m14e', 'end-6-straight']))), parts, defaultShopRules);
    expect(edge.flags.filter((f) => f.code.startsWith('joint-'))).toEqual([]);
    expect(edge.bom.rows.some((r) => r.kind === 'seal' && /M14/.test(r.description))).toBe(false);
  });

  it('an ISO 6149 O-ring port with a sealing-edge stud is a joint-seat blocker', () => {
    const { flags } = evaluateCircuit(
      coolerCircuit((d) => {
        d.units[0].ports[0].connection = { family: 'metric', size: 'M14x1.5', gender: 'female', seat: 'o-ring' };
        d.lines[0].endStacks.from = ['adp-m14e', 'end-6-straight'];
      }),
      parts,
      defaultShopRules,
    );
    expect(flags.some((f) => f.code === 'joint-seat')).toBe(true);
  });
});
