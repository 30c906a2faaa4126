import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { generateCatalogue, randomHoseEndSide, seededRandom } from '../../bench/generate-catalogue.js';
import type { ConnectionSpec } from '../connections.js';
import { demoParts } from '../demo/demo-catalogue.js';
import { mate } from '../mating/mate.js';
import type { Part } from '../parts/part.schema.js';
import type { ChainPart } from './adapter-index.js';
import { solveAdapters, type AdapterChain } from './solve-adapters.js';

const s = (family: ConnectionSpec['family'], size: string, gender: ConnectionSpec['gender']): ConnectionSpec => ({ family, size, gender });
const minusSixHoseEnd = s('flare37', '-6', 'female');

function ends(part: ChainPart, orientation: 'a-to-port' | 'b-to-port') {
  const { a, b } = part.attributes;
  return orientation === 'a-to-port' ? { inward: a, outward: b } : { inward: b, outward: a };
}

/** Re-checks a chain from its parts and orientations alone. */
function expectChainMates(port: ConnectionSpec, hoseEndSide: ConnectionSpec, chain: AdapterChain): void {
  let outward = port;
  chain.parts.forEach((part, i) => {
    const { inward, outward: next } = ends(part, chain.orientations[i]);
    expect(mate(outward, inward).ok).toBe(true);
    outward = next;
  });
  expect(mate(outward, hoseEndSide).ok).toBe(true);
  expect(chain.joints).toHaveLength(chain.parts.length + 1);
  expect(chain.joints.every((j) => j.ok)).toBe(true);
  expect(chain.cautionCount).toBe(chain.joints.filter((j) => j.caution !== undefined).length);
  expect(chain.partCount).toBe(chain.parts.length);
}

type RankKey = [parts: number, cautions: number, negBore: number, price: number];
/** Ranking key written out here: parts ascending, cautioned joints ascending, smallest bore descending, price ascending. */
function rankKey(c: { partCount: number; cautionCount: number; minBoreIn: number | null; priceCents: number }): RankKey {
  return [c.partCount, c.cautionCount, -(c.minBoreIn ?? Infinity), c.priceCents];
}
function keyLess(x: RankKey, y: RankKey): number {
  return x[0] - y[0] || x[1] - y[1] || (x[2] === y[2] ? 0 : x[2] < y[2] ? -1 : 1) || x[3] - y[3];
}

/** Every chain by plain enumeration (no index, no search order), with the solver's rules. */
function bruteForce(port: ConnectionSpec, hoseEndSide: ConnectionSpec, parts: readonly Part[], maxParts: number) {
  const chainParts = parts.filter((p): p is ChainPart => (p.kind === 'adapter' || p.kind === 'bulkhead') && !p.retired);
  // The generator gives one seat form per seat group, so the seat as written identifies the end.
  const keyOf = (c: ConnectionSpec) => `${c.family}|${c.size}|${c.gender}|${c.seat ?? ''}`;
  const found: RankKey[] = [];
  const walk = (outward: ConnectionSpec, seen: string[], count: number, cautions: number, bore: number, price: number) => {
    const last = mate(outward, hoseEndSide);
    if (last.ok) found.push(rankKey({ partCount: count, cautionCount: cautions + (last.caution ? 1 : 0), minBoreIn: count === 0 ? null : bore, priceCents: price }));
    if (count === maxParts) return;
    for (const part of chainParts) {
      const symmetric = keyOf(part.attributes.a) === keyOf(part.attributes.b);
      for (const orientation of symmetric ? (['a-to-port'] as const) : (['a-to-port', 'b-to-port'] as const)) {
        const e = ends(part, orientation);
        const joint = mate(outward, e.inward);
        if (!joint.ok || seen.includes(keyOf(e.outward))) continue;
        walk(e.outward, [...seen, keyOf(e.outward)], count + 1, cautions + (joint.caution ? 1 : 0), Math.min(bore, part.attributes.boreIn), price + part.priceCents);
      }
    }
  };
  walk(port, [keyOf(port)], 0, 0, Infinity, 0);
  return found.sort(keyLess);
}

describe('solveAdapters on the demo catalogue', () => {
  it('worked trade check (common practice): a 5/8-18 inverted-flare cooler port (3/8 in tube) and a -6 hose take one adapter', () => {
    const chains = solveAdapters(s('invflare45', '3/8', 'female'), minusSixHoseEnd, demoParts);
    expect(chains[0].partCount).toBe(1);
    expect(chains[0].parts[0].id).toBe('demo-adapter-invf6-f37-6');
    expect(chains[0].orientations[0]).toBe('a-to-port');
    expectChainMates(s('invflare45', '3/8', 'female'), minusSixHoseEnd, chains[0]);
  });

  it('returns the zero-part chain when the port and hose end mate directly', () => {
    const chains = solveAdapters(s('flare37', '-6', 'male'), minusSixHoseEnd, demoParts);
    expect(chains[0]).toMatchObject({ partCount: 0, cautionCount: 0, parts: [], minBoreIn: null, priceCents: 0, bodyLengthIn: 0 });
    expect(chains[0].joints).toHaveLength(1);
  });

  it('long-nose requirement: only chains whose port-side part has the feature', () => {
    const port = s('orb', '-6', 'female');
    const all = solveAdapters(port, minusSixHoseEnd, demoParts);
    expect(all.some((c) => !c.parts[0].id.endsWith('-long'))).toBe(true);
    const required = solveAdapters(port, minusSixHoseEnd, demoParts, { requirement: { feature: 'long-nose' } });
    expect(required.length).toBeGreaterThan(0);
    for (const chain of required) {
      const first = chain.parts[0];
      expect(first.kind === 'adapter' && first.attributes.features.includes('long-nose')).toBe(true);
    }
  });

  it('a requirement cannot be met by a zero-part chain', () => {
    expect(solveAdapters(s('flare37', '-6', 'male'), minusSixHoseEnd, demoParts, { requirement: { feature: 'long-nose' } })).toEqual([]);
  });

  it('finds the two-part chain through a reducer when needed, and respects maxParts', () => {
    const port = s('orb', '-8', 'female');
    const chains = solveAdapters(port, minusSixHoseEnd, demoParts);
    expect(chains[0].partCount).toBe(2);
    chains.forEach((c) => expectChainMates(port, minusSixHoseEnd, c));
    expect(solveAdapters(port, minusSixHoseEnd, demoParts, { maxParts: 1 })).toEqual([]);
  });

  it('sums body length and price, and reports the smallest bore', () => {
    const [chain] = solveAdapters(s('orb', '-8', 'female'), minusSixHoseEnd, demoParts);
    expect(chain.bodyLengthIn).toBeCloseTo(chain.parts.reduce((t, p) => t + p.attributes.bodyLengthIn, 0), 10);
    expect(chain.priceCents).toBe(chain.parts.reduce((t, p) => t + p.priceCents, 0));
    expect(chain.minBoreIn).toBe(Math.min(...chain.parts.map((p) => p.attributes.boreIn)));
  });

  it('leaves retired parts out unless asked', () => {
    const retired = demoParts.map((p) => (p.id === 'demo-adapter-invf6-f37-6' ? { ...p, retired: true } : p));
    const port = s('invflare45', '3/8', 'female');
    expect(solveAdapters(port, minusSixHoseEnd, retired)).toEqual([]);
    expect(solveAdapters(port, minusSixHoseEnd, retired, { excludeRetired: false })).toHaveLength(1);
  });

  it('returns nothing for a barb or unknown hose-end side, and never for mismatched ends', () => {
    expect(solveAdapters(s('orb', '-6', 'female'), s('barb', '-6', 'female'), demoParts)).toEqual([]);
    expect(solveAdapters(s('orb', '-6', 'female'), s('flare37', '-7', 'female'), demoParts)).toEqual([]);
  });
});

describe('solveAdapters properties (fast-check over seeded generated catalogues)', () => {
  it('every joint of every chain mates, chains are ranked, limits hold, no retired parts', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), fc.integer({ min: 1, max: 3 }), fc.integer({ min: 1, max: 12 }), (seed, maxParts, limit) => {
        const parts = generateCatalogue(300, seed);
        const random = seededRandom(seed + 7);
        const adapters = parts.filter((p) => p.kind === 'adapter');
        const entry = adapters[Math.floor(random() * adapters.length)];
        const port: ConnectionSpec = entry.kind === 'adapter' ? { ...entry.attributes.a, gender: 'female' } : s('orb', '-6', 'female');
        const hoseEndSide = randomHoseEndSide(random);
        const chains = solveAdapters(port, hoseEndSide, parts, { maxParts, limit });
        expect(chains.length).toBeLessThanOrEqual(limit);
        chains.forEach((chain, i) => {
          expectChainMates(port, hoseEndSide, chain);
          expect(chain.partCount).toBeLessThanOrEqual(maxParts);
          expect(chain.parts.some((p) => p.retired)).toBe(false);
          if (i > 0) expect(keyLess(rankKey(chains[i - 1]), rankKey(chain))).toBeLessThanOrEqual(0);
        });
      }),
      { numRuns: 60 },
    );
  });

  it('returns the same best keys as plain enumeration on small catalogues', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), (seed) => {
        const parts = generateCatalogue(40, seed);
        const random = seededRandom(seed + 11);
        const adapters = parts.filter((p) => p.kind === 'adapter');
        const entry = adapters[Math.floor(random() * adapters.length)];
        const port: ConnectionSpec = entry.kind === 'adapter' ? { ...entry.attributes.a, gender: 'female' } : s('orb', '-6', 'female');
        // Half the queries aim at the entry adapter's far end so most have chains to compare.
        const far = entry.kind === 'adapter' ? entry.attributes.b : undefined;
        const hoseEndSide: ConnectionSpec =
          far && far.family !== 'barb' && random() < 0.5 ? { ...far, gender: far.gender === 'male' ? 'female' : 'male' } : randomHoseEndSide(random);
        const expected = bruteForce(port, hoseEndSide, parts, 3).slice(0, 10);
        const got = solveAdapters(port, hoseEndSide, parts, { maxParts: 3, limit: 10 }).map(rankKey);
        expect(got).toEqual(expected);
      }),
      { numRuns: 150 },
    );
  });

  it('with a requirement, every chain starts with a part carrying the feature', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), (seed) => {
        const parts = generateCatalogue(300, seed);
        const random = seededRandom(seed + 3);
        const longNose = parts.filter((p) => p.kind === 'adapter' && p.attributes.features.includes('long-nose'));
        const entry = longNose[Math.floor(random() * longNose.length)];
        if (!entry || entry.kind !== 'adapter') return;
        const port: ConnectionSpec = { ...entry.attributes.a, gender: 'female' };
        for (const chain of solveAdapters(port, randomHoseEndSide(random), parts, { requirement: { feature: 'long-nose' } })) {
          const first = chain.parts[0];
          expect(first.kind === 'adapter' && first.attributes.features.includes('long-nose')).toBe(true);
        }
      }),
      { numRuns: 40 },
    );
  });
});
