import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectedThreads, sameExpectedThread, type ExpectedThread } from '../../test/expected-threads.js';
import { familySchema, type ConnectionSpec, type Gender } from '../connections.js';
import { listSizes } from '../standards/tables.js';
import { mate } from './mate.js';

const s = (family: ConnectionSpec['family'], size: string, gender: Gender): ConnectionSpec => ({ family, size, gender });

describe('mating matrix over every family and size (DOMAIN.md §1 Mating table, threads per the cited standards)', () => {
  // Expected code from DOMAIN.md's table, applied to the thread data written from the standards.
  function expectedCode(a: ExpectedThread, ga: Gender, b: ExpectedThread, gb: Gender): string {
    if (!sameExpectedThread(a, b)) return 'joint-thread';
    if (ga === gb) return 'joint-gender';
    if (a.family !== b.family) return 'joint-seat';
    return 'ok';
  }

  it('gives the expected code for every pair of ends, both ways round', () => {
    const genders: Gender[] = ['male', 'female'];
    let checked = 0;
    for (const a of expectedThreads) {
      for (const b of expectedThreads) {
        for (const ga of genders) {
          for (const gb of genders) {
            const result = mate(s(a.family, a.size, ga), s(b.family, b.size, gb));
            const want = expectedCode(a, ga, b, gb);
            if (result.code !== want) expect.fail(`${a.family} ${a.size} ${ga} vs ${b.family} ${b.size} ${gb}: ${result.code}, want ${want}`);
            expect(result.ok).toBe(want === 'ok');
            checked += 1;
          }
        }
      }
    }
    expect(checked).toBe(expectedThreads.length ** 2 * 4);
  });

  it('never mates a hose barb with anything (a barb takes a hose, not a port; common practice)', () => {
    for (const size of listSizes('barb')) {
      expect(mate(s('barb', size, 'male'), s('barb', size, 'female')).code).toBe('joint-thread');
      expect(mate(s('barb', size, 'male'), s('flare37', size, 'female')).code).toBe('joint-thread');
    }
  });
});

describe('named cases (DOMAIN.md §1)', () => {
  it('37° vs 45° flare at -4 (both 7/16-20, SAE J514 / J512): threads engage, seats differ', () => {
    const r = mate(s('flare37', '-4', 'male'), s('flare45', '1/4', 'female'));
    expect(r.code).toBe('joint-seat');
    expect(r.hint).toMatch(/seat/);
  });
  it('37° flare male in an O-ring boss port: joint-seat, hint mentions the O-ring', () => {
    const r = mate(s('flare37', '-6', 'male'), s('orb', '-6', 'female'));
    expect(r.code).toBe('joint-seat');
    expect(r.hint).toMatch(/O-ring/);
  });
  it('-3 37° flare vs 3/16 inverted flare (both 3/8-24): joint-seat', () => {
    expect(mate(s('flare37', '-3', 'female'), s('invflare45', '3/16', 'male')).code).toBe('joint-seat');
  });
  it('-6 37° (9/16-18) vs 3/8 45° (5/8-18): joint-thread, with a seat hint as they look alike', () => {
    const r = mate(s('flare37', '-6', 'male'), s('flare45', '3/8', 'female'));
    expect(r.code).toBe('joint-thread');
    expect(r.hint).toMatch(/37°/);
    expect(r.hint).toMatch(/45°/);
  });
  it('1/4 NPT (18 TPI, 0.540 in) vs -6 O-ring boss (9/16-18): joint-thread with a taper hint', () => {
    const r = mate(s('npt', '1/4', 'male'), s('orb', '-6', 'female'));
    expect(r.code).toBe('joint-thread');
    expect(r.hint).toMatch(/taper/i);
  });
  it('M16x1.5 (ISO 261) vs 5/8-18 (SAE J512): joint-thread, pitch hint (1.5 mm vs 1.41 mm pitch)', () => {
    const r = mate(s('metric', 'M16x1.5', 'male'), s('flare45', '3/8', 'female'));
    expect(r.code).toBe('joint-thread');
    expect(r.hint).toMatch(/pitch/);
  });
  it('NPT into NPT of the same size is ok and reminds about sealant', () => {
    const r = mate(s('npt', '3/8', 'male'), s('npt', '3/8', 'female'));
    expect(r).toMatchObject({ ok: true, code: 'ok' });
    expect(r.message).toMatch(/sealant/);
  });
  it('different threads that do not look alike carry no hint', () => {
    expect(mate(s('flare37', '-4', 'male'), s('npt', '1', 'female')).hint).toBeUndefined();
  });
  it('unknown sizes are a joint-thread with a clear message, never a throw', () => {
    const r = mate(s('flare37', '-7', 'male'), s('flare37', '-7', 'female'));
    expect(r.code).toBe('joint-thread');
    expect(r.message).toMatch(/Unknown size/);
    expect(r.message).toMatch(/-7/);
  });
  it('accepts sizes written loosely ("6" for "-6")', () => {
    expect(mate(s('orb', '6', 'male'), s('orb', '-6', 'female')).ok).toBe(true);
  });
});

describe('properties (fast-check)', () => {
  const knownSize = fc.constantFrom(...familySchema.options.flatMap((f) => listSizes(f)));
  const spec = fc.record({
    family: fc.constantFrom(...familySchema.options),
    size: fc.oneof(knownSize, fc.string({ minLength: 1, maxLength: 8 })),
    gender: fc.constantFrom<Gender>('male', 'female'),
  });

  it('mate is symmetric', () => {
    fc.assert(
      fc.property(spec, spec, (a, b) => {
        expect(mate(a, b)).toEqual(mate(b, a));
      }),
      { numRuns: 2000 },
    );
  });

  it('an end always mates with its opposite-gender twin of a known threaded size', () => {
    fc.assert(
      fc.property(fc.constantFrom(...familySchema.options.filter((f) => f !== 'barb')), fc.nat(), (family, i) => {
        const sizes = listSizes(family);
        const size = sizes[i % sizes.length];
        expect(mate(s(family, size, 'male'), s(family, size, 'female')).ok).toBe(true);
      }),
    );
  });
});
