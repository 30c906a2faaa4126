import { describe, expect, it } from 'vitest';
import { familySchema, type Family } from '../connections.js';
import { b1201, iso6149, sae512flare45, sae512inverted, sae514 } from '../../test/expected-threads.js';
import { dashToTubeOd } from './dash.js';
import { threadTable } from './reference.js';
import { sealForPort } from './seal.js';
import { familyLabel, families, isValidSize, listSizes, threadOf } from './tables.js';

describe('37° flare, SAE J514', () => {
  it.each(sae514)('-%i: tube %f in, %s', (dash, tubeOdIn, designation, majorIn, tpi) => {
    expect(dashToTubeOd(dash).in).toBeCloseTo(tubeOdIn, 10);
    const thread = threadOf({ family: 'flare37', size: `-${dash}` });
    expect(thread).toMatchObject({ designation, tpi, tapered: false });
    expect(thread!.majorDiameterIn).toBeCloseTo(majorIn, 10);
    const row = threadTable('flare37').find((r) => r.size === `-${dash}`);
    expect(row?.tubeOdIn).toBeCloseTo(tubeOdIn, 10);
    expect(row?.source).toMatch(/SAE J514/);
  });
  it('lists exactly the J514 dash sizes', () => {
    expect(listSizes('flare37')).toEqual(sae514.map(([dash]) => `-${dash}`));
  });
});

describe('O-ring boss, SAE J1926-1 / AS5202', () => {
  it.each(sae514)('-%i uses the J514 thread and an AS568 -9NN O-ring (from memory)', (dash, _od, designation, majorIn, tpi) => {
    const thread = threadOf({ family: 'orb', size: `-${dash}` });
    expect(thread).toMatchObject({ designation, tpi });
    expect(thread!.majorDiameterIn).toBeCloseTo(majorIn, 10);
    expect(sealForPort({ family: 'orb', size: `-${dash}`, gender: 'female' })).toEqual({
      type: 'o-ring',
      as568: `9${String(dash).padStart(2, '0')}`,
    });
  });
  it('-6 takes AS568-906 (DOMAIN.md example)', () => {
    expect(sealForPort({ family: 'orb', size: '-6', gender: 'male' })).toEqual({ type: 'o-ring', as568: '906' });
    expect(threadTable('orb').find((r) => r.size === '-6')?.seal).toBe('O-ring AS568-906');
  });
});

describe.each([
  ['flare45' as Family, sae512flare45, /SAE J512/],
  ['invflare45' as Family, sae512inverted, /SAE J512/],
])('%s, SAE J512', (family, rows, source) => {
  it.each(rows)('%s → %s', (size, thread, majorIn, tpi) => {
    const info = threadOf({ family, size });
    expect(info?.designation.startsWith(`${thread} `)).toBe(true);
    expect(info?.majorDiameterIn).toBeCloseTo(majorIn, 10);
    expect(info?.tpi).toBe(tpi);
    expect(threadTable(family).find((r) => r.size === size)?.source).toMatch(source);
  });
});

describe('inverted flare sources', () => {
  it('marks only 3/16 and 1/4 as confirmed and the rest from memory (DOMAIN.md §1)', () => {
    for (const row of threadTable('invflare45')) {
      const confirmed = row.size === '3/16' || row.size === '1/4';
      expect(row.source.includes('from memory'), row.size).toBe(!confirmed);
    }
  });
});

describe('NPT, ASME B1.20.1 Table 2', () => {
  it.each(b1201)('%s → %s, OD %f, %f TPI, tapered', (size, designation, od, tpi) => {
    expect(threadOf({ family: 'npt', size })).toMatchObject({ designation, majorDiameterIn: od, tpi, tapered: true });
    expect(threadTable('npt').find((r) => r.size === size)?.source).toMatch(/ASME B1\.20\.1, Table 2/);
  });
});

describe('Metric, ISO 261 / ISO 6149', () => {
  it.each(iso6149)('%s: %f mm × %f mm pitch, O-ring port', (size, diameterMm, pitchMm) => {
    const info = threadOf({ family: 'metric', size });
    expect(info?.majorDiameterIn).toBeCloseTo(diameterMm / 25.4, 10);
    expect(info?.pitchMm).toBe(pitchMm);
    expect(info?.tapered).toBe(false);
    expect(sealForPort({ family: 'metric', size, gender: 'female' })?.type).toBe('o-ring');
  });
  it('accepts the size written loosely and refuses a pitchless "fine"', () => {
    expect(isValidSize('metric', 'm14 x 1.5')).toBe(true);
    expect(isValidSize('metric', 'M14')).toBe(false);
    expect(isValidSize('metric', 'M14 fine')).toBe(false);
  });
});

describe('Hose barb (common practice)', () => {
  it('has dash sizes and no thread', () => {
    expect(listSizes('barb')).toContain('-6');
    const info = threadOf({ family: 'barb', size: '-6' });
    expect(info?.tpi).toBeUndefined();
    expect(info?.pitchMm).toBeUndefined();
    expect(sealForPort({ family: 'barb', size: '-6', gender: 'male' })).toBeUndefined();
  });
});

describe('families and sizes', () => {
  it('names every family in plain words', () => {
    expect(families.map(familyLabel)).toEqual(
      expect.arrayContaining(['37° flare', '45° SAE flare', 'Inverted 45° flare', 'O-ring boss', 'NPT pipe thread', 'Metric', 'Hose barb']),
    );
    expect([...families].sort()).toEqual([...familySchema.options].sort());
  });
  it('validates sizes the way each family writes them', () => {
    expect(isValidSize('flare37', '-6')).toBe(true);
    expect(isValidSize('flare37', '6')).toBe(true);
    expect(isValidSize('flare37', '-7')).toBe(false);
    expect(isValidSize('npt', '1/4')).toBe(true);
    expect(isValidSize('npt', '-4')).toBe(false);
    expect(threadOf({ family: 'flare45', size: '7/8' })).toBeUndefined();
  });
  it('has no seal for flare seats or pipe threads', () => {
    expect(sealForPort({ family: 'flare37', size: '-6', gender: 'female' })).toBeUndefined();
    expect(sealForPort({ family: 'npt', size: '1/4', gender: 'female' })).toBeUndefined();
  });
  it('converts dash to tube OD in mm (25.4 mm/in): -6 = 9.525 mm', () => {
    expect(dashToTubeOd(6).mm).toBeCloseTo(9.525, 6);
    expect(() => dashToTubeOd(0)).toThrow(RangeError);
  });
  it('gives a basic pitch diameter for straight threads only', () => {
    expect(threadOf({ family: 'orb', size: '-6' })?.basicPitchDiameterIn).toBeCloseTo(0.5264, 4); // ASME B1.1
    expect(threadOf({ family: 'npt', size: '1/4' })?.basicPitchDiameterIn).toBeUndefined();
  });
});
