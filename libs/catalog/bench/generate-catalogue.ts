import type { ConnectionSpec, Family, Gender, SeatForm } from '../src/connections.js';
import type { Part } from '../src/parts/part.schema.js';
import { families, listSizes } from '../src/standards/tables.js';

/** Small seeded generator (mulberry32) so generated catalogues are the same on every run. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function pick<T>(random: () => number, items: readonly T[]): T {
  return items[Math.floor(random() * items.length)];
}

const matableFamilies = families.filter((f) => f !== 'barb');
/** Dash sizes most lines use; generated hose-side ends stay among them so chains exist. */
const commonDashes = ['-4', '-6', '-8', '-10', '-12'];
/** One seat form per seat group, so an end's seat as written names its group. */
const seatsOf: Partial<Record<Family, readonly SeatForm[]>> = {
  metric: ['o-ring', 'bonded-washer', 'cone24-l', 'cone24-s'],
  bspp: ['bonded-washer', 'cone60'],
};

export function randomEnd(random: () => number, gender?: Gender): ConnectionSpec {
  const family: Family = pick(random, matableFamilies);
  const seats = seatsOf[family];
  const g = gender ?? pick(random, ['male', 'female'] as const);
  if (!seats) return { family, size: pick(random, listSizes(family)), gender: g };
  const seat = pick(random, seats);
  return { family, size: pick(random, listSizes(family, seat)), gender: g, seat };
}

export function randomHoseEndSide(random: () => number): ConnectionSpec {
  return { family: 'flare37', size: pick(random, commonDashes), gender: 'female' };
}

/**
 * A catalogue of `count` parts, mostly adapters (port thread to 37° flare, flare reducers and
 * odd pairs), some bulkheads and hose ends; a few retired and a few long-nose.
 */
export function generateCatalogue(count: number, seed = 1): Part[] {
  const random = seededRandom(seed);
  const parts: Part[] = [];
  for (let i = 0; i < count; i += 1) {
    const roll = random();
    const common = {
      id: `gen-${i}`,
      supplierId: null,
      supplierPartNumber: `GEN-${i}`,
      description: `Generated part ${i}`,
      priceCents: 200 + Math.floor(random() * 3000),
      saleUnit: { type: 'each' as const },
      stockOnHand: 0,
      retired: random() < 0.05,
    };
    const bore = 0.15 + Math.round(random() * 40) / 100;
    if (roll < 0.8) {
      const a = randomEnd(random, 'male');
      const b: ConnectionSpec =
        random() < 0.6 ? { family: 'flare37', size: pick(random, commonDashes), gender: pick(random, ['male', 'female'] as const) } : randomEnd(random);
      parts.push({
        ...common,
        kind: 'adapter',
        attributes: {
          a,
          b,
          angle: pick(random, [0, 45, 90] as const),
          bodyLengthIn: 0.5 + Math.round(random() * 20) / 10,
          boreIn: bore,
          features: random() < 0.05 ? ['long-nose'] : [],
        },
      });
    } else if (roll < 0.85) {
      const size = pick(random, commonDashes);
      parts.push({
        ...common,
        kind: 'bulkhead',
        attributes: { a: { family: 'flare37', size, gender: 'male' }, b: randomEnd(random), bodyLengthIn: 2, boreIn: bore },
      });
    } else {
      const size = pick(random, commonDashes);
      parts.push({
        ...common,
        kind: 'hose-end',
        attributes: {
          hoseDash: Number(size.slice(1)),
          hoseTypes: ['braided-rubber'],
          port: { family: 'flare37', size, gender: 'female' },
          angle: 0,
          allowanceIn: 1,
          boreIn: bore,
          maxPressurePsi: 1000,
        },
      });
    }
  }
  return parts;
}
