import { describe, expect, it } from 'vitest';
import type { ConnectionSpec } from '../connections.js';
import { partConnections } from '../parts/part-connections.js';
import { partSchema, type PartOf } from '../parts/part.schema.js';
import { hoseEndFitsHose } from '../parts/hose-end-fits-hose.js';
import { fitsOd } from '../parts/fits-od.js';
import { solveAdapters } from '../solver/solve-adapters.js';
import { sealForPort } from '../standards/seal.js';
import { isValidConnection } from '../standards/tables.js';
import { compoundProblem } from '../seals/seal-compounds.js';
import { demoParts, demoSuppliers } from './demo-catalogue.js';

const s = (family: ConnectionSpec['family'], size: string, gender: ConnectionSpec['gender']): ConnectionSpec => ({ family, size, gender });

describe('demo catalogue', () => {
  it('every part passes the part schema unchanged', () => {
    for (const part of demoParts) expect(partSchema.parse(part), part.id).toEqual(part);
  });

  it('has unique stable ids and invented suppliers at .example addresses', () => {
    const ids = demoParts.map((p) => p.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const id of ids) expect(id).toMatch(/^demo-[a-z0-9-]+$/);
    expect(demoSuppliers).toHaveLength(2);
    for (const supplier of demoSuppliers) expect(supplier.email).toMatch(/@[a-z0-9-]+\.example$/);
    const supplierIds = new Set(demoSuppliers.map((x) => x.id));
    for (const part of demoParts) expect(supplierIds.has(part.supplierId ?? ''), part.id).toBe(true);
  });

  it('uses only sizes (and seat forms) in the thread tables', () => {
    for (const part of demoParts) {
      for (const end of partConnections(part)) expect(isValidConnection(end), `${part.id} ${end.family} ${end.size} ${end.seat ?? ''}`).toBe(true);
    }
  });

  it('has -6 and -8 hose in a rubber and a PTFE liner and a -6 J1532 cooler hose, sold by the foot, only PTFE rated for E85', () => {
    const hoses = demoParts.filter((p) => p.kind === 'hose');
    expect(hoses.map((h) => h.id).sort()).toEqual(['demo-hose-6-cooler', 'demo-hose-6-ptfe', 'demo-hose-6-rubber', 'demo-hose-8-ptfe', 'demo-hose-8-rubber']);
    for (const hose of hoses) {
      expect(hose.saleUnit).toEqual({ type: 'foot' });
      expect(hose.attributes.fluids.includes('e85')).toBe(hose.attributes.liner === 'ptfe');
    }
    // SAE J1532 Type A: 250 psi working pressure, 150 °C (302 °F) class (DOMAIN.md §1).
    const cooler = hoses.find((h) => h.id === 'demo-hose-6-cooler')!;
    expect(cooler.attributes).toMatchObject({ hoseClass: 'sae-j1532-150', maxPressurePsi: 250, maxTempF: 302 });
  });

  it('names every seal with its compound, and has a fluorocarbon O-ring for each O-ring boss size it stocks in nitrile (E85 fuel)', () => {
    const seals = demoParts.filter((p) => p.kind === 'seal');
    for (const seal of seals) {
      expect(seal.attributes.compound, seal.id).toBeDefined();
      expect(seal.description).toMatch(new RegExp(seal.attributes.compound!));
    }
    expect(seals.find((s) => s.id === 'demo-oring-906-fkm')?.description).toBe('O-ring AS568-906, 90 Shore A fluorocarbon, pack of 10');
    for (const as568 of ['906', '908', '910']) {
      const forE85 = seals.filter((s) => s.attributes.seal.type === 'o-ring' && s.attributes.seal.as568 === as568 && compoundProblem(s.attributes.compound!, 'e85') === undefined);
      expect(forE85.length, as568).toBeGreaterThan(0);
    }
  });

  it('has a straight, 45° and 90° hose end fitting each hose, and a clamp and a sleeve for each hose OD', () => {
    for (const hose of demoParts.filter((p) => p.kind === 'hose')) {
      const fitting = demoParts.filter((p): p is PartOf<'hose-end'> => p.kind === 'hose-end' && hoseEndFitsHose(p, hose));
      const angles = new Set(fitting.filter((e) => e.attributes.port.family === 'flare37').map((e) => e.attributes.angle));
      expect([...angles].sort((a, b) => a - b)).toEqual([0, 45, 90]);
      expect(demoParts.some((p) => p.kind === 'clamp' && fitsOd(p, hose.attributes.odIn)), `clamp for ${hose.id}`).toBe(true);
      expect(demoParts.some((p) => p.kind === 'sleeve' && fitsOd(p, hose.attributes.odIn)), `sleeve for ${hose.id}`).toBe(true);
    }
  });

  it('stocks the O-rings and washers its O-ring boss, ISO 6149, washer-sealed metric and BSPP adapters need', () => {
    const stocked = demoParts.flatMap((p) => (p.kind === 'seal' ? [JSON.stringify(p.attributes.seal)] : []));
    for (const part of demoParts) {
      if (part.kind !== 'adapter') continue;
      const need = sealForPort(part.attributes.a);
      if (need) {
        expect(part.attributes.seal, part.id).toEqual(need);
        expect(stocked, part.id).toContain(JSON.stringify(need));
      }
    }
  });

  // The demo circuits' ports (PRODUCT.md demo scenario) each reach their hose end.
  it.each([
    ['transmission 1/4 NPT out port', s('npt', '1/4', 'female'), '-6'],
    ['transmission -6 ORB return port', s('orb', '-6', 'female'), '-6'],
    ['cooler 5/8-18 inverted flare port', s('invflare45', '3/8', 'female'), '-6'],
    ['engine M22x1.5 oil port', s('metric', 'M22x1.5', 'female'), '-8'],
    ['cooler -10 ORB oil port', s('orb', '-10', 'female'), '-8'],
    ['fuel -8 ORB port', s('orb', '-8', 'female'), '-8'],
    ['fuel -6 ORB port', s('orb', '-6', 'female'), '-6'],
    ['tank 3/8 NPT port', s('npt', '3/8', 'female'), '-8'],
    // Issue 14 demo: imported transmission, BSPP cooler, factory quick-connect line.
    ['imported transmission M14x1.5 washer-sealed port', { ...s('metric', 'M14x1.5', 'female'), seat: 'bonded-washer' as const }, '-6'],
    ['imported transmission M14x1.5 sealing-edge port (same ISO 9974-1 port)', { ...s('metric', 'M14x1.5', 'female'), seat: 'sealing-edge' as const }, '-6'],
    ['imported transmission M14x1.5 ISO 6149 port', { ...s('metric', 'M14x1.5', 'female'), seat: 'o-ring' as const }, '-6'],
    ['BSPP cooler 1/2 port', { ...s('bspp', '1/2', 'female'), seat: 'bonded-washer' as const }, '-8'],
    ['BSPP cooler 3/8 port', s('bspp', '3/8', 'female'), '-6'],
    ['factory 3/8 quick-connect line end form', s('qc', '3/8', 'male'), '-6'],
    ['factory 5/16 quick-connect line end form', s('qc', '5/16', 'male'), '-6'],
    ['-6 O-ring face seal pump port', s('orfs', '-6', 'male'), '-6'],
    ['1/4 NPT male pipe end with a 30° seat, through the NPSM swivel (caution)', s('npt', '1/4', 'male'), '-6'],
  ])('%s joins its hose end with one adapter', (_name, port, dash) => {
    const chains = solveAdapters(port, s('flare37', dash, 'female'), demoParts);
    expect(chains[0]?.partCount).toBe(1);
  });

  it('an M14x1.5 O-ring port is never offered the washer or sealing-edge stud (seat mismatch)', () => {
    const chains = solveAdapters({ ...s('metric', 'M14x1.5', 'female'), seat: 'o-ring' }, s('flare37', '-6', 'female'), demoParts);
    expect(chains.map((c) => c.parts[0].id)).not.toContain('demo-adapter-m14w-f37-6');
    expect(chains.map((c) => c.parts[0].id)).not.toContain('demo-adapter-m14e-f37-6');
  });

  it('the banjo hose end bolts into an M14x1.5 banjo port directly', () => {
    expect(solveAdapters(s('banjo', 'M14x1.5', 'female'), s('banjo', 'M14x1.5', 'male'), demoParts)[0]?.partCount).toBe(0);
  });

  it('has the long-nose -6 ORB fitting and its short counterpart', () => {
    const orb6 = demoParts.filter(
      (p) => p.kind === 'adapter' && p.attributes.a.family === 'orb' && p.attributes.a.size === '-6' && p.attributes.angle === 0,
    );
    const longNose = orb6.filter((p) => p.kind === 'adapter' && p.attributes.features.includes('long-nose'));
    expect(longNose).toHaveLength(1);
    expect(orb6.length).toBeGreaterThan(1);
  });
});
