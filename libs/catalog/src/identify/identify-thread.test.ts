import { describe, expect, it } from 'vitest';
import { expectedThreads, sameExpectedThread, type ExpectedThread } from '../../test/expected-threads.js';
import { identifyThread, type ThreadCandidate } from './identify-thread.js';

const byKey = new Map(expectedThreads.map((t) => [`${t.family}|${t.size}`, t]));
function threadOfCandidate(c: ThreadCandidate): ExpectedThread {
  const t = byKey.get(`${c.family}|${c.size}`);
  if (!t) throw new Error(`candidate not in the expected tables: ${c.family} ${c.size}`);
  return t;
}

/** The top candidate has the row's thread, and the row itself is among the equally best. */
function expectRankedFirst(row: ExpectedThread, candidates: ThreadCandidate[]): void {
  expect(candidates.length, `${row.family} ${row.size}`).toBeGreaterThan(0);
  const top = candidates[0];
  expect(sameExpectedThread(threadOfCandidate(top), row), `${row.family} ${row.size}: got ${top.family} ${top.size}`).toBe(true);
  const own = candidates.find((c) => c.family === row.family && c.size === row.size);
  expect(own?.score, `${row.family} ${row.size} listed`).toBe(top.score);
}

describe('identifyThread ranks the right size first for readings off nominal (tables as cited in DOMAIN.md §1)', () => {
  const threaded = expectedThreads.filter((t) => t.threaded);
  const inchRows = threaded.filter((t) => t.family !== 'metric');
  const metricRows = threaded.filter((t) => t.family === 'metric');

  it.each([-0.005, 0, 0.005])('inch threads, diameter %f in off, TPI read exactly, taper and flank angle (55°/60° gauge) known', (offset) => {
    for (const row of inchRows) {
      const candidates = identifyThread({ odIn: row.majorIn + offset, tpi: 25.4 / row.pitchMm, tapered: row.tapered, flankAngleDeg: row.flankDeg });
      expectRankedFirst(row, candidates);
    }
  });

  it.each([-0.1, 0, 0.1])('metric threads, diameter %f mm off, pitch in mm', (offset) => {
    for (const row of metricRows) {
      expectRankedFirst(row, identifyThread({ odMm: row.majorIn * 25.4 + offset, pitchMm: row.pitchMm, tapered: false }));
    }
  });

  it('metric read with an inch pitch gauge (TPI = 25.4 / pitch, rounded to 0.1) still finds metric', () => {
    for (const row of metricRows) {
      const tpi = Math.round((25.4 / row.pitchMm) * 10) / 10;
      expectRankedFirst(row, identifyThread({ odMm: row.majorIn * 25.4 - 0.1, tpi }));
    }
  });

  it('without saying whether it tapers, the right size still ties for best; a tapered rival says to check for taper', () => {
    // e.g. 3/4 NPT read at its large end (~1.059 in, 14 TPI) is a true look-alike of 1-1/16-14.
    for (const row of inchRows) {
      const candidates = identifyThread({ odIn: row.majorIn - 0.004, tpi: 25.4 / row.pitchMm, flankAngleDeg: row.flankDeg });
      const own = candidates.find((c) => c.family === row.family && c.size === row.size);
      expect(own?.score, `${row.family} ${row.size}`).toBe(candidates[0].score);
      for (const rival of candidates.filter((c) => c.score === own?.score)) {
        if (threadOfCandidate(rival).tapered !== row.tapered) expect(rival.hint + (own?.hint ?? '')).toMatch(/taper/);
      }
    }
  });
});

describe('real readings', () => {
  it('a worn -6 male reading 0.552 in (about 0.010 under 9/16) is still 9/16-18 (ASME B1.1 class 2A major is below basic)', () => {
    const [first, second] = identifyThread({ odIn: 0.552, tpi: 18 });
    expect([first.family, second.family].sort()).toEqual(['flare37', 'orb']);
    expect(first.designation).toBe('9/16-18 UNF');
  });

  it('a male 1/4 NPT measured at its small end (E0 + 0.8/n = 0.5218 in, ASME B1.20.1 Table 2) is still 1/4 NPT', () => {
    const [first] = identifyThread({ odIn: 0.5218, tpi: 18, tapered: true });
    expect(first).toMatchObject({ family: 'npt', size: '1/4' });
    // Without the taper, the straight 1/4-18 NPSM (major 0.526 max, from memory) ties with it.
    const untold = identifyThread({ odIn: 0.5218, tpi: 18 });
    expect(untold.filter((c) => c.score === untold[0].score).map((c) => c.family)).toEqual(expect.arrayContaining(['npt', 'npsm']));
  });

  it('1/4 NPT and 9/16-18 both appear for an 18 TPI reading between them, with a taper hint (DOMAIN.md look-alike)', () => {
    const candidates = identifyThread({ odIn: 0.55, tpi: 18 });
    const families = candidates.map((c) => c.family);
    expect(families).toContain('npt');
    expect(families).toContain('orb');
    expect(candidates.find((c) => c.family === 'npt')?.hint).toMatch(/taper/);
  });

  it('one candidate per family sharing a thread, each saying how to tell them apart (7/16-20: SAE J514, J512, J1926-1; banjo bolt common practice)', () => {
    const candidates = identifyThread({ odIn: 0.4375, tpi: 20 });
    const top = candidates.filter((c) => c.score === candidates[0].score);
    expect(top.map((c) => c.family).sort()).toEqual(['banjo', 'flare37', 'flare45', 'orb']);
    for (const c of top) expect(c.hint).toMatch(/Same thread as/);
  });

  it('a 1/4-19 reading (BSP, ISO 228-1 / ISO 7-1) finds BSP first and still lists 1/4 NPT (18 TPI), asking about 55° against 60°', () => {
    const candidates = identifyThread({ odMm: 13.1, tpi: 19 });
    expect(['bspp', 'bspt']).toContain(candidates[0].family);
    expect(candidates[0].size).toBe('1/4');
    const npt = candidates.find((c) => c.family === 'npt' && c.size === '1/4');
    expect(npt).toBeDefined();
    expect(candidates[0].question).toMatch(/55°/);
    expect(candidates[0].hint).toMatch(/19 against 18/);
  });

  it('a 3/8-19 reading (16.66 mm, ISO 228-1) gives BSP 3/8 candidates', () => {
    const candidates = identifyThread({ odIn: 0.655, tpi: 19 });
    expect(candidates.slice(0, 2).map((c) => `${c.family} ${c.size}`).sort()).toEqual(['bspp 3/8', 'bspt 3/8']);
  });

  it('a 1/8-28 reading at 0.383 in (9.73 mm, ISO 228-1) ranks BSP above 1/8-27 NPT (0.405 in, ASME B1.20.1) and says how to tell them apart', () => {
    const candidates = identifyThread({ odIn: 0.383, tpi: 28 });
    expect(candidates[0].flankAngleDeg).toBe(55);
    const npt = candidates.find((c) => c.family === 'npt' && c.size === '1/8');
    expect(npt).toBeDefined();
    expect(npt!.score).toBeLessThan(candidates[0].score);
    expect(npt!.question).toMatch(/55° thread gauge/);
  });

  it('once a 60° gauge fits, a 1/2-14 reading drops BSP below NPT; with 55° the other way round', () => {
    const sixty = identifyThread({ odIn: 0.835, tpi: 14, tapered: true, flankAngleDeg: 60 });
    expect(sixty[0].family).toMatch(/^npt/);
    expect(sixty[0].question).toBeUndefined();
    const fiftyFive = identifyThread({ odIn: 0.835, tpi: 14, tapered: true, flankAngleDeg: 55 });
    expect(fiftyFive[0]).toMatchObject({ family: 'bspt', size: '1/2' });
  });

  it('scores lie in 0..1 and come best first', () => {
    const candidates = identifyThread({ odIn: 0.75, tpi: 16 });
    for (let i = 0; i < candidates.length; i += 1) {
      expect(candidates[i].score).toBeGreaterThan(0);
      expect(candidates[i].score).toBeLessThanOrEqual(1);
      if (i > 0) expect(candidates[i].score).toBeLessThanOrEqual(candidates[i - 1].score);
    }
  });

  it('rejects non-positive numbers with a RangeError and returns nothing for an empty reading', () => {
    expect(() => identifyThread({ odIn: 0, tpi: 18 })).toThrow(RangeError);
    expect(() => identifyThread({ odIn: 0.5, tpi: -18 })).toThrow(RangeError);
    expect(() => identifyThread({ odMm: Number.NaN })).toThrow(RangeError);
    expect(identifyThread({})).toEqual([]);
  });

  it('a diameter far from every table gives no candidates', () => {
    expect(identifyThread({ odIn: 5, tpi: 4 })).toEqual([]);
  });
});
