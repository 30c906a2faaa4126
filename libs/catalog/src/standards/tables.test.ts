import { describe, expect, it } from 'vitest';
import { familySchema, type Family } from '../connections.js';
import {
  b1201,
  b1201npsm,
  banjoBolts,
  iso228,
  iso228PitchMm,
  iso6149,
  iso6149Oring,
  iso7,
  iso8434L,
  iso8434S,
  iso9974,
  j1453,
  j2044,
  sae512flare45,
  sae512inverted,
  sae514,
  washerExtra,
} from '../../test/expected-threads.js';
import { dashToTubeOd } from './dash.js';
import { threadTable } from './reference.js';
import { sealForPort, sealsForPort } from './seal.js';
import { cone24TubeOd, seatFormsOf } from './seat-forms.js';
import { connectionProblem, familyLabel, families, isValidConnection, isValidSize, listSizes, threadOf } from './tables.js';

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
  it.each(iso6149)('%s: %f mm × %f mm pitch, ISO 6149-1 O-ring port (sizes and O-rings from memory)', (size, diameterMm, pitchMm) => {
    const info = threadOf({ family: 'metric', size });
    expect(info?.majorDiameterIn).toBeCloseTo(diameterMm / 25.4, 10);
    expect(info?.pitchMm).toBe(pitchMm);
    expect(info?.tapered).toBe(false);
    expect(info?.flankAngleDeg).toBe(60);
    expect(sealForPort({ family: 'metric', size, gender: 'female', seat: 'o-ring' })).toEqual({
      type: 'o-ring',
      as568: `ISO 6149-1 ${size} (${iso6149Oring[size]})`,
    });
    // Left out, the seat is the ISO 6149 O-ring port the metric family meant before seat forms.
    expect(sealForPort({ family: 'metric', size, gender: 'female' })).toEqual(sealForPort({ family: 'metric', size, gender: 'female', seat: 'o-ring' }));
  });
  it('lists exactly the ISO 6149-1 sizes for the O-ring seat and the ISO 9974-1 sizes for the sealing edge', () => {
    expect(listSizes('metric', 'o-ring')).toEqual(iso6149.map(([size]) => size));
    expect(listSizes('metric', 'sealing-edge')).toEqual(iso9974);
    expect([...listSizes('metric', 'bonded-washer')].sort()).toEqual([...iso9974, ...washerExtra].sort());
  });
  it.each([...iso9974, ...washerExtra])('%s washer-sealed port (ISO 9974-2 / DIN 3852; x1.25 sizes common practice) takes a bonded washer, not an O-ring', (size) => {
    const diameter = size.slice(1).split('x')[0];
    expect(sealsForPort({ family: 'metric', size, gender: 'female', seat: 'bonded-washer' })).toEqual([{ type: 'bonded-washer', size: `M${diameter}` }]);
  });
  it.each(iso9974)('%s sealing-edge port (ISO 9974-3) needs no separate seal', (size) => {
    expect(sealsForPort({ family: 'metric', size, gender: 'female', seat: 'sealing-edge' })).toEqual([]);
  });
  it.each([
    ...iso8434L.map(([size, od]) => ['cone24-l' as const, size, od] as const),
    ...iso8434S.map(([size, od]) => ['cone24-s' as const, size, od] as const),
  ])('ISO 8434-1 24° cone %s %s takes %i mm tube (from memory)', (seat, size, tubeOdMm) => {
    expect(cone24TubeOd(size, seat)).toBe(tubeOdMm);
    expect(isValidConnection({ family: 'metric', size, seat })).toBe(true);
    expect(threadOf({ family: 'metric', size })?.pitchMm).toBe(Number(size.split('x')[1]));
  });
  it('has the sizes the issue asks for: M8x1, M10x1.25, M12x1.25, M20x1.5, M24x1.5, M26x1.5, M30x2, M33x2 (ISO 261)', () => {
    for (const size of ['M8x1', 'M10x1.25', 'M12x1.25', 'M20x1.5', 'M24x1.5', 'M26x1.5', 'M30x2', 'M33x2']) expect(isValidSize('metric', size), size).toBe(true);
  });
  it('refuses a seat form a size is not made in, and names it', () => {
    expect(isValidConnection({ family: 'metric', size: 'M24x1.5', seat: 'o-ring' })).toBe(false); // not in ISO 6149-1
    expect(connectionProblem({ family: 'metric', size: 'M24x1.5', seat: 'o-ring' })).toMatch(/O-ring port \(ISO 6149\)/);
    expect(isValidConnection({ family: 'metric', size: 'M24x1.5', seat: 'cone24-s' })).toBe(true); // 16S
    expect(isValidConnection({ family: 'metric', size: 'M14x1.5', seat: 'cone60' })).toBe(false); // a BSP seat form
  });
  it('accepts the size written loosely and refuses a pitchless "fine"', () => {
    expect(isValidSize('metric', 'm14 x 1.5')).toBe(true);
    expect(isValidSize('metric', 'M14')).toBe(false);
    expect(isValidSize('metric', 'M14 fine')).toBe(false);
  });
});

describe('BSP parallel, ISO 228-1 Table 1 (55° Whitworth form)', () => {
  it.each(iso228)('%s-%i: major %f mm, parallel, 55°', (size, tpi, majorMm) => {
    const info = threadOf({ family: 'bspp', size });
    expect(info).toMatchObject({ tpi, tapered: false, flankAngleDeg: 55 });
    expect(info!.majorDiameterIn * 25.4).toBeCloseTo(majorMm, 6);
    expect(info!.designation).toBe(`${size}-${tpi} BSPP (G ${size})`);
    expect(threadTable('bspp').find((r) => r.size === size)?.source).toMatch(/ISO 228-1, Table 1/);
  });
  it.each(Object.entries(iso228PitchMm))('%s: basic pitch diameter %f mm (ISO 228-1 Table 1)', (size, pitchMm) => {
    expect(threadOf({ family: 'bspp', size })!.basicPitchDiameterIn! * 25.4).toBeCloseTo(pitchMm, 2);
  });
  it('lists exactly the ISO 228-1 sizes asked for; seats washer, O-ring, sealing edge and 60° cone', () => {
    expect(listSizes('bspp')).toEqual(iso228.map(([size]) => size));
    expect(seatFormsOf('bspp').map((s) => s.seat)).toEqual(['bonded-washer', 'o-ring', 'sealing-edge', 'cone60']);
    expect(sealsForPort({ family: 'bspp', size: '1/4', gender: 'female' })).toEqual([{ type: 'bonded-washer', size: '1/4 BSP' }]);
    expect(sealsForPort({ family: 'bspp', size: '1/4', gender: 'female', seat: 'cone60' })).toEqual([]);
  });
});

describe('BSP taper, ISO 7-1 Table 1', () => {
  it.each(iso7)('%s-%i: gauge diameter %f mm, tapered, 55°', (size, tpi, majorMm) => {
    const info = threadOf({ family: 'bspt', size });
    expect(info).toMatchObject({ tpi, tapered: true, flankAngleDeg: 55 });
    expect(info!.majorDiameterIn * 25.4).toBeCloseTo(majorMm, 6);
    expect(info!.basicPitchDiameterIn).toBeUndefined();
    expect(threadTable('bspt').find((r) => r.size === size)?.source).toMatch(/ISO 7-1/);
  });
  it('has no 5/8 (ISO 7-1 has no such size)', () => {
    expect(isValidSize('bspt', '5/8')).toBe(false);
    expect(listSizes('bspt')).toEqual(iso7.map(([size]) => size));
  });
});

describe('NPTF dryseal, ASME B1.20.3 (sizes and pitches of ASME B1.20.1 Table 2)', () => {
  it.each(b1201)('%s → %s, OD %f, %f TPI, tapered', (size, designation, od, tpi) => {
    expect(threadOf({ family: 'nptf', size })).toMatchObject({ designation: `${designation}F`, majorDiameterIn: od, tpi, tapered: true, flankAngleDeg: 60 });
    expect(threadTable('nptf').find((r) => r.size === size)?.source).toMatch(/ASME B1\.20\.3/);
  });
});

describe('NPSM, ASME B1.20.1 (straight pipe, 30° seat; major diameters from memory)', () => {
  it.each(b1201npsm)('%s → %s, major %f, %f TPI, straight', (size, designation, major, tpi) => {
    expect(threadOf({ family: 'npsm', size })).toMatchObject({ designation, majorDiameterIn: major, tpi, tapered: false });
    expect(threadTable('npsm').find((r) => r.size === size)?.source).toMatch(/ASME B1\.20\.1 NPSM/);
  });
});

describe('O-ring face seal, SAE J1453 / ISO 8434-3', () => {
  it.each(j1453)('-%i: %s, face O-ring AS568-%s (O-ring from memory)', (dash, designation, majorIn, tpi, oring) => {
    const info = threadOf({ family: 'orfs', size: `-${dash}` });
    expect(info).toMatchObject({ designation, tpi, tapered: false });
    expect(info!.majorDiameterIn).toBeCloseTo(majorIn, 10);
    expect(sealsForPort({ family: 'orfs', size: `-${dash}`, gender: 'male' })).toEqual([{ type: 'o-ring', as568: oring }]);
    expect(threadTable('orfs').find((r) => r.size === `-${dash}`)?.tubeOdIn).toBeCloseTo(dash / 16, 10);
    expect(threadTable('orfs').find((r) => r.size === `-${dash}`)?.source).toMatch(/SAE J1453/);
  });
  it('lists exactly the J1453 sizes', () => {
    expect(listSizes('orfs')).toEqual(j1453.map(([dash]) => `-${dash}`));
  });
});

describe('Banjo bolts (ISO 261 / ASME B1.1 threads; sizes common practice)', () => {
  it.each(banjoBolts)('%s: major %f in, pitch %f mm, two crush washers per joint', (size, majorIn, pitchMm) => {
    const info = threadOf({ family: 'banjo', size });
    expect(info!.majorDiameterIn).toBeCloseTo(majorIn, 10);
    const pitch = info!.pitchMm ?? 25.4 / info!.tpi!;
    expect(pitch).toBeCloseTo(pitchMm, 10);
    const washers = sealsForPort({ family: 'banjo', size, gender: 'female' });
    expect(washers).toHaveLength(2);
    expect(washers.every((w) => w.type === 'crush-washer')).toBe(true);
  });
  it('names washers by the bolt they fit over and accepts inch sizes written with their series', () => {
    expect(sealForPort({ family: 'banjo', size: 'M14x1.5', gender: 'male' })).toEqual({ type: 'crush-washer', size: 'M14' });
    expect(sealForPort({ family: 'banjo', size: '3/8-24 UNF', gender: 'male' })).toEqual({ type: 'crush-washer', size: '3/8 in' });
  });
});

describe('Quick-connect, SAE J2044 (by tube OD, from memory)', () => {
  it.each(j2044)('%s: tube OD %f in, no thread, no separate seal', (size, odIn) => {
    const info = threadOf({ family: 'qc', size });
    expect(info!.majorDiameterIn).toBeCloseTo(odIn, 10);
    expect(info!.tpi).toBeUndefined();
    expect(sealsForPort({ family: 'qc', size, gender: 'male' })).toEqual([]);
  });
  it('accepts "8 mm" and "3/8 in"', () => {
    expect(isValidSize('qc', '8 mm')).toBe(true);
    expect(isValidSize('qc', '3/8 in')).toBe(true);
    expect(isValidSize('qc', '9mm')).toBe(false);
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
      expect.arrayContaining([
        '37° flare',
        '45° SAE flare',
        'Inverted 45° flare',
        'O-ring boss',
        'NPT pipe thread',
        'Metric',
        'Hose barb',
        'BSP parallel (ISO 228-1)',
        'BSP taper (ISO 7-1)',
        'O-ring face seal',
      ]),
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
