import { describe, expect, it } from 'vitest';
import type { ConnectionSpec } from '../connections.js';
import { partConnections } from '../parts/part-connections.js';
import { partSchema } from '../parts/part.schema.js';
import { hoseEndFitsHose } from '../parts/hose-end-fits-hose.js';
import { fitsOd } from '../parts/fits-od.js';
import { solveAdapters } from '../solver/solve-adapters.js';
import { sealForPort } from '../standards/seal.js';
import { isValidSize } from '../standards/tables.js';
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

  it('uses only sizes in the thread tables', () => {
    for (const part of demoParts) {
      for (const end of partConnections(part)) expect(isValidSize(end.family, end.size), `${part.id} ${end.family} ${end.size}`).toBe(true);
    }
  });

  it('has -6 and -8 hose in a rubber and a PTFE liner, sold by the foot, PTFE rated for E85', () => {
    const hoses = demoParts.filter((p) => p.kind === 'hose');
    expect(hoses.map((h) => h.id).sort()).toEqual(['demo-hose-6-ptfe', 'demo-hose-6-rubber', 'demo-hose-8-ptfe', 'demo-hose-8-rubber']);
    for (const hose of hoses) {
      expect(hose.saleUnit).toEqual({ type: 'foot' });
      expect(hose.attributes.fluids.includes('e85')).toBe(hose.attributes.liner === 'ptfe');
    }
  });

  it('has a straight, 45° and 90° hose end fitting each hose, and a clamp and a sleeve for each hose OD', () => {
    for (const hose of demoParts.filter((p) => p.kind === 'hose')) {
      const fitting = demoParts.filter((p) => p.kind === 'hose-end' && hoseEndFitsHose(p, hose));
      expect(fitting.map((e) => (e.kind === 'hose-end' ? e.attributes.angle : -1)).sort((a, b) => a - b)).toEqual([0, 45, 90]);
      expect(demoParts.some((p) => p.kind === 'clamp' && fitsOd(p, hose.attributes.odIn)), `clamp for ${hose.id}`).toBe(true);
      expect(demoParts.some((p) => p.kind === 'sleeve' && fitsOd(p, hose.attributes.odIn)), `sleeve for ${hose.id}`).toBe(true);
    }
  });

  it('stocks the O-rings its O-ring boss and ISO 6149 adapters need', () => {
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
  ])('%s joins its hose end with one adapter', (_name, port, dash) => {
    const chains = solveAdapters(port, s('flare37', dash, 'female'), demoParts);
    expect(chains[0]?.partCount).toBe(1);
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
