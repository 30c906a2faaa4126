import { performance } from 'node:perf_hooks';
import type { ConnectionSpec } from '../src/connections.js';
import { identifyThread } from '../src/identify/identify-thread.js';
import { solveAdapters } from '../src/solver/solve-adapters.js';
import { families, familyRows } from '../src/standards/tables.js';
import { generateCatalogue, randomHoseEndSide, seededRandom } from './generate-catalogue.js';

export interface BenchResult {
  name: string;
  median: number;
  unit: string;
  goal?: number;
  ok?: boolean;
}

const CATALOGUE_SIZE = 2000;
const QUERIES = 400;
const SOLVE_GOAL_MS = 2;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

function solverQueries(parts: ReturnType<typeof generateCatalogue>, seed: number): Array<[ConnectionSpec, ConnectionSpec]> {
  const random = seededRandom(seed);
  const adapters = parts.filter((p) => p.kind === 'adapter');
  return Array.from({ length: QUERIES }, () => {
    const entry = adapters[Math.floor(random() * adapters.length)];
    const port: ConnectionSpec = entry.kind === 'adapter' ? { ...entry.attributes.a, gender: 'female' } : { family: 'orb', size: '-6', gender: 'female' };
    return [port, randomHoseEndSide(random)];
  });
}

/** Median time per solveAdapters query on a generated 2,000-part catalogue, and per identifyThread call. */
export async function benchCatalog(): Promise<BenchResult[]> {
  const parts = generateCatalogue(CATALOGUE_SIZE, 2024);
  const queries = solverQueries(parts, 99);

  // First call builds the per-catalogue index; time it on its own.
  const indexStart = performance.now();
  solveAdapters(queries[0][0], queries[0][1], parts);
  const firstQueryMs = performance.now() - indexStart;

  for (const [port, hoseEnd] of queries.slice(0, 50)) solveAdapters(port, hoseEnd, parts); // warm-up
  const solveTimes: number[] = [];
  let found = 0;
  for (const [port, hoseEnd] of queries) {
    const start = performance.now();
    const chains = solveAdapters(port, hoseEnd, parts);
    solveTimes.push(performance.now() - start);
    if (chains.length > 0) found += 1;
  }

  const random = seededRandom(7);
  const rows = families.flatMap((f) => familyRows(f)).filter((r) => r.threaded);
  const readings = Array.from({ length: QUERIES }, () => {
    const row = rows[Math.floor(random() * rows.length)];
    const tpi = row.tpi ?? 25.4 / (row.pitchMm ?? 1);
    return { odIn: row.majorDiameterIn + (random() - 0.5) * 0.01, tpi };
  });
  for (const reading of readings.slice(0, 50)) identifyThread(reading);
  const identifyTimes = readings.map((reading) => {
    const start = performance.now();
    identifyThread(reading);
    return performance.now() - start;
  });

  const solveMedian = median(solveTimes);
  return [
    { name: `catalog: solveAdapters per query (${CATALOGUE_SIZE} parts, ${QUERIES} queries, ${found} with chains)`, median: solveMedian, unit: 'ms', goal: SOLVE_GOAL_MS, ok: solveMedian <= SOLVE_GOAL_MS },
    { name: 'catalog: first solveAdapters query incl. building the adapter index', median: firstQueryMs, unit: 'ms' },
    { name: `catalog: identifyThread per call (${QUERIES} readings)`, median: median(identifyTimes), unit: 'ms' },
  ];
}
