import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectedThreads, sameExpectedThread, type ExpectedThread } from '../../test/expected-threads.js';
import { familySchema, seatFormSchema, type ConnectionSpec, type Gender } from '../connections.js';
import { seatFormsOf } from '../standards/seat-forms.js';
import { listSizes } from '../standards/tables.js';
import { mate } from './mate.js';

const s = (family: ConnectionSpec['family'], size: string, gender: Gender, seat?: ConnectionSpec['seat']): ConnectionSpec =>
  seat === undefined ? { family, size, gender } : { family, size, gender, seat };

describe('mating matrix over every family, size and seat form (DOMAIN.md §1 Mating table and issue 14, threads per the cited standards)', () => {
  /** Taper-into-parallel joins: ISO 7-1 (R male into a parallel female); an NPSM swivel on a pipe-thread male (common practice). */
  const taperIntoParallel: Array<[taper: string, parallel: string]> = [
    ['bspt', 'bspp'],
    ['npt', 'npsm'],
    ['nptf', 'npsm'],
  ];
  // Expected code (and whether a caution comes with it), from the mating rules applied to the
  // thread data written from the standards.
  function expected(a: ExpectedThread, ga: Gender, b: ExpectedThread, gb: Gender): { code: string; caution: boolean } {
    const none = { caution: false };
    if (!a.threaded || !b.threaded) {
      if (a.family === 'qc' && b.family === 'qc' && a.size === b.size) return { code: ga === gb ? 'joint-gender' : 'ok', ...none };
      return { code: 'joint-thread', ...none };
    }
    if (!sameExpectedThread(a, b)) {
      const pair = taperIntoParallel.find(([t, p]) => (a.family === t && b.family === p) || (a.family === p && b.family === t));
      if (pair && a.size === b.size && Math.abs(a.pitchMm - b.pitchMm) < 1e-9) {
        if (ga === gb) return { code: 'joint-gender', ...none };
        const male = ga === 'male' ? a : b;
        return male.family === pair[0] ? { code: 'ok', caution: true } : { code: 'joint-thread', ...none };
      }
      return { code: 'joint-thread', ...none };
    }
    if (ga === gb) return { code: 'joint-gender', ...none };
    if (a.family !== b.family) {
      const pipe = new Set([a.family, b.family]);
      return pipe.has('npt') && pipe.has('nptf') ? { code: 'ok', caution: true } : { code: 'joint-seat', ...none };
    }
    if (a.seatGroup !== b.seatGroup) return { code: 'joint-seat', ...none };
    return { code: 'ok', ...none };
  }

  it('gives the expected code for every pair of ends, both ways round', () => {
    const genders: Gender[] = ['male', 'female'];
    let checked = 0;
    for (const a of expectedThreads) {
      for (const b of expectedThreads) {
        for (const ga of genders) {
          for (const gb of genders) {
            const result = mate(s(a.family, a.size, ga, a.seat), s(b.family, b.size, gb, b.seat));
            const want = expected(a, ga, b, gb);
            const label = `${a.family} ${a.size} ${a.seat ?? ''} ${ga} vs ${b.family} ${b.size} ${b.seat ?? ''} ${gb}`;
            if (result.code !== want.code) expect.fail(`${label}: ${result.code}, want ${want.code}`);
            if ((result.caution !== undefined) !== want.caution) expect.fail(`${label}: caution ${result.caution}, want ${want.caution}`);
            if (result.ok !== (want.code === 'ok')) expect.fail(`${label}: ok ${result.ok}`);
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

describe('new families (issue 14 named cases)', () => {
  it('1/4 BSPT male (19 TPI, 55°, ISO 7-1) into 1/4 NPT female (18 TPI, 60°, ASME B1.20.1): joint-thread with a look-alike hint', () => {
    const r = mate(s('bspt', '1/4', 'male'), s('npt', '1/4', 'female'));
    expect(r.code).toBe('joint-thread');
    expect(r.ok).toBe(false);
    expect(r.hint).toMatch(/55°/);
    expect(r.hint).toMatch(/60°/);
    expect(r.hint).toMatch(/19 against 18|18 against 19/);
  });
  it('1/2 BSPT and 1/2 NPT share 14 TPI (ISO 7-1 / ASME B1.20.1) but not the form: joint-thread with a flank-angle hint', () => {
    const r = mate(s('bspt', '1/2', 'male'), s('npt', '1/2', 'female'));
    expect(r.code).toBe('joint-thread');
    expect(r.hint).toMatch(/55°/);
  });
  it('-4 ORFS male (9/16-18, SAE J1453) into a -6 37° flare female (9/16-18, SAE J514): joint-seat with a look-alike hint', () => {
    const r = mate(s('orfs', '-4', 'male'), s('flare37', '-6', 'female'));
    expect(r.code).toBe('joint-seat');
    expect(r.hint).toMatch(/face/i);
    expect(r.hint).toMatch(/37°/);
  });
  it('M14x1.5 ISO 6149 O-ring port with an ISO 9974-3 sealing-edge male: joint-seat', () => {
    const r = mate(s('metric', 'M14x1.5', 'female', 'o-ring'), s('metric', 'M14x1.5', 'male', 'sealing-edge'));
    expect(r.code).toBe('joint-seat');
    expect(r.message).toMatch(/ISO 6149/);
    expect(r.message).toMatch(/Sealing edge/);
  });
  it('an ISO 9974-1 port takes the washer stud and the sealing-edge stud alike (ISO 9974-1 ports serve ISO 9974-2 and -3)', () => {
    expect(mate(s('metric', 'M14x1.5', 'female', 'bonded-washer'), s('metric', 'M14x1.5', 'male', 'sealing-edge')).ok).toBe(true);
  });
  it('24° cone L and S series on the same M16x1.5 thread (10L vs 8S, ISO 8434-1) do not join', () => {
    expect(mate(s('metric', 'M16x1.5', 'female', 'cone24-l'), s('metric', 'M16x1.5', 'male', 'cone24-s')).code).toBe('joint-seat');
  });
  it('a metric banjo bolt in a metric port of the same thread is a seat mismatch', () => {
    expect(mate(s('banjo', 'M14x1.5', 'male'), s('metric', 'M14x1.5', 'female', 'bonded-washer')).code).toBe('joint-seat');
  });
  it('NPTF male into NPT female joins with a caution about sealant (ASME B1.20.3 dryseal not assured against NPT)', () => {
    const r = mate(s('nptf', '1/4', 'male'), s('npt', '1/4', 'female'));
    expect(r).toMatchObject({ ok: true, code: 'ok' });
    expect(r.caution).toMatch(/sealant/);
    expect(mate(s('nptf', '1/4', 'male'), s('nptf', '1/4', 'female')).caution).toBeUndefined();
  });
  it('BSPT male into a BSPP female joins as ISO 7-1 allows, with a caution; BSPP male into BSPT female does not', () => {
    const ok = mate(s('bspt', '3/8', 'male'), s('bspp', '3/8', 'female'));
    expect(ok).toMatchObject({ ok: true, code: 'ok' });
    expect(ok.caution).toMatch(/ISO 7-1/);
    expect(mate(s('bspp', '3/8', 'male'), s('bspt', '3/8', 'female')).code).toBe('joint-thread');
  });
  it('BSPP 1/4-19 (13.157 mm, ISO 228-1) against 9/16-18 (14.29 mm): different threads', () => {
    expect(mate(s('bspp', '1/4', 'male'), s('orb', '-6', 'female')).code).toBe('joint-thread');
  });
  it('a quick-connect end form joins only its own size of connector; 5/16 in and 8 mm look alike (7.94 vs 8.00 mm)', () => {
    expect(mate(s('qc', '3/8', 'male'), s('qc', '3/8', 'female')).ok).toBe(true);
    expect(mate(s('qc', '3/8', 'male'), s('qc', '3/8', 'male')).code).toBe('joint-gender');
    const r = mate(s('qc', '5/16', 'male'), s('qc', '8mm', 'female'));
    expect(r.code).toBe('joint-thread');
    expect(r.hint).toMatch(/tube OD/);
    expect(mate(s('qc', '3/8', 'male'), s('flare37', '-6', 'female')).code).toBe('joint-thread');
  });
});

describe('properties (fast-check)', () => {
  const knownSize = fc.constantFrom(...familySchema.options.flatMap((f) => listSizes(f)));
  const spec = fc.record(
    {
      family: fc.constantFrom(...familySchema.options),
      size: fc.oneof(knownSize, fc.string({ minLength: 1, maxLength: 8 })),
      gender: fc.constantFrom<Gender>('male', 'female'),
      seat: fc.constantFrom(...seatFormSchema.options),
    },
    { requiredKeys: ['family', 'size', 'gender'] },
  );

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
      fc.property(fc.constantFrom(...familySchema.options.filter((f) => f !== 'barb')), fc.nat(), fc.nat(), (family, i, j) => {
        const seats = seatFormsOf(family);
        const seat = seats.length === 0 ? undefined : seats[j % seats.length].seat;
        const sizes = listSizes(family, seat);
        const size = sizes[i % sizes.length];
        expect(mate(s(family, size, 'male', seat), s(family, size, 'female', seat)).ok).toBe(true);
      }),
    );
  });
});
