/**
 * Benchmark of the routing engine: evaluateCircuit on a generated (seeded) circuit of 300 lines,
 * 60 units and 6,000 route points (goal: median ≤ 5 ms), how it scales from 30 lines (goal ≤ 11×), a
 * one-line edit through createEvaluator (goal ≤ 0.3 ms) and the worst document the work budget
 * admits (goal ≤ 200 ms).
 * Run: `node libs/routing/bench/main.mjs` (loads this file through Vite's module runner).
 */
import { checkWorkBudget, circuitDocumentSchema, createEvaluator, defaultShopRules, evaluateCircuit, type CircuitDocument } from '../src/index.js';
import { testParts } from '../src/test-support/fixtures.js';

export interface BenchRow {
  name: string;
  median: number;
  unit: string;
  goal?: number;
  ok?: boolean;
}

/** Small seeded generator (mulberry32) so every run measures the same circuit. */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const PORTS_PER_UNIT = 10;
const PX_PER_IN = 10;

/**
 * A circuit of `lineCount` lines and lineCount / 5 units on a 200 × 80 in vehicle, each line
 * wandering gently through 20 corners (bend radii 2–3 in) between its two ports, near 8 exhaust zones.
 */
export function generateCircuit(lineCount: number, seed = 7): CircuitDocument {
  const random = seeded(seed);
  const between = (lo: number, hi: number) => lo + (hi - lo) * random();
  const unitCount = Math.max(2, Math.ceil((lineCount * 2) / PORTS_PER_UNIT));
  const units = Array.from({ length: unitCount }, (_, u) => ({
    id: `u${u}`,
    kind: u % 2 === 0 ? ('transmission' as const) : ('cooler' as const),
    x: between(0, 200 * PX_PER_IN),
    y: between(0, 80 * PX_PER_IN),
    rotation: 0,
    mountGroup: u % 3 === 0 ? ('powertrain' as const) : ('chassis' as const),
    ports: Array.from({ length: PORTS_PER_UNIT }, (_, p) => ({
      id: `p${p}`,
      connection:
        p % 2 === 0
          ? { family: 'orb' as const, size: '-6', gender: 'female' as const }
          : { family: 'flare37' as const, size: '-6', gender: 'male' as const },
      role: 'out' as const,
      dx: between(-40, 40),
      dy: between(-40, 40),
    })),
  }));
  const ports = units.flatMap((u) =>
    u.ports.map((p) => ({ unitId: u.id, portId: p.id, orb: p.connection.family === 'orb', x: u.x + p.dx, y: u.y + p.dy })),
  );
  const lines = Array.from({ length: lineCount }, (_, i) => {
    const from = ports[2 * i];
    const to = ports[(2 * i + 1 + 2 * PORTS_PER_UNIT) % ports.length]; // a port on another unit
    const [dx, dy] = [to.x - from.x, to.y - from.y];
    const length = Math.hypot(dx, dy) || 1;
    const [nx, ny] = [-dy / length, dx / length];
    const wiggle = between(10, 40);
    const phase = between(0, Math.PI);
    const points = Array.from({ length: 20 }, (_, k) => {
      const f = (k + 1) / 21;
      const side = wiggle * Math.sin(phase + f * Math.PI * 4);
      return { x: from.x + dx * f + nx * side, y: from.y + dy * f + ny * side, bendRadiusIn: between(2, 3) };
    });
    const stack = (orb: boolean) => (orb ? ['adp-orb6-fl6', 'end-6-straight'] : ['end-6-straight']);
    const supportCount = Math.floor(length / PX_PER_IN / 15);
    return {
      id: `L${i}`,
      from: { unitId: from.unitId, portId: from.portId },
      to: { unitId: to.unitId, portId: to.portId },
      hosePartId: 'hose-6',
      points,
      endStacks: { from: stack(from.orb), to: stack(to.orb) },
      supports: Array.from({ length: supportCount }, (_, k) => ({ id: `s${k}`, atIn: (k + 1) * 15 })),
      sleeves: [{ id: 'v0', startIn: 10, endIn: 30, partId: 'sleeve-3-4' }],
    };
  });
  const heatZones = Array.from({ length: 8 }, (_, z) => {
    const cx = between(10, 190) * PX_PER_IN;
    const cy = between(10, 70) * PX_PER_IN;
    return {
      id: `z${z}`,
      kind: 'exhaust' as const,
      polygon: Array.from({ length: 6 }, (_, k) => ({
        x: cx + 60 * Math.cos((k * Math.PI) / 3),
        y: cy + 25 * Math.sin((k * Math.PI) / 3),
      })),
    };
  });
  return circuitDocumentSchema.parse({
    schema: 'linesmith.circuit/1',
    circuit: { fluid: 'atf', maxPressurePsi: 150, maxTempF: 250 },
    calibration: { a: { x: 0, y: 0 }, b: { x: 10 * PX_PER_IN, y: 0 }, knownIn: 10 },
    background: null,
    units,
    lines,
    heatZones,
  });
}

function medianMs(run: () => unknown, iterations: number): number {
  for (let i = 0; i < 5; i++) run(); // warm up the JIT
  const times: number[] = [];
  for (let i = 0; i < iterations; i++) {
    const start = performance.now();
    run();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  const mid = times.length >> 1;
  return times.length % 2 ? times[mid] : (times[mid - 1] + times[mid]) / 2;
}

/** The same circuit with corner 5 of line k moved by dx px: a drag, sharing every untouched object. */
function dragged(doc: CircuitDocument, k: number, dx: number): CircuitDocument {
  const line = doc.lines[k];
  const points = line.points.map((p, i) => (i === 5 ? { ...p, x: p.x + dx } : p));
  return { ...doc, lines: doc.lines.map((l, i) => (i === k ? { ...line, points } : l)) };
}

/**
 * Documents built to cost the most within the work budget (WORK_LIMITS): route points at the
 * limit, every corner sharp (a bend flag each); and lines zig-zagging through a comb-shaped heat
 * zone (every chord crosses dozens of edges), as many as the corner-zone pairs allow.
 */
export function worstAdmissible(): Array<{ name: string; doc: CircuitDocument }> {
  const unit = (id: string, x: number, ports: number) => ({
    id,
    kind: 'cooler' as const,
    x,
    y: 0,
    mountGroup: 'chassis' as const,
    ports: Array.from({ length: ports }, (_, p) => ({ id: `p${p}`, connection: { family: 'flare37' as const, size: '-6', gender: 'male' as const }, role: 'out' as const, dx: 0, dy: p })),
  });
  const base = (lines: unknown[], heatZones: unknown[], ports: number) =>
    circuitDocumentSchema.parse({
      schema: 'linesmith.circuit/1',
      circuit: { fluid: 'atf', maxPressurePsi: 150, maxTempF: 250 },
      calibration: { a: { x: 0, y: 0 }, b: { x: 10 * PX_PER_IN, y: 0 }, knownIn: 10 },
      background: null,
      units: Array.from({ length: Math.ceil(ports / 32) }, (_, u) => [unit(`a${u}`, 0, 32), unit(`b${u}`, 3000, 32)]).flat(),
      lines,
      heatZones,
    });
  const line = (i: number, points: unknown[]) => ({
    id: `L${i}`,
    from: { unitId: `a${Math.floor(i / 32)}`, portId: `p${i % 32}` },
    to: { unitId: `b${Math.floor(i / 32)}`, portId: `p${i % 32}` },
    hosePartId: 'hose-6',
    points,
    endStacks: { from: ['end-6-straight'], to: ['end-6-straight'] },
  });
  // As many lines × 200 sharp corners as the route-point limit allows (ports count too).
  const sharpDoc = (lines: number) =>
    base(
      Array.from({ length: lines }, (_, i) => line(i, Array.from({ length: 200 }, (_, k) => ({ x: 10 + k * 14, y: 50 + i * 20 + (k % 2) * 15, bendRadiusIn: 0 })))),
      [],
      lines,
    );
  let lines = 1;
  while (checkWorkBudget(sharpDoc(lines + 1), defaultShopRules).ok) lines++;
  const sharp = sharpDoc(lines);
  // A comb of 49 teeth (200 points); each line crosses every tooth on every leg.
  const teeth = 49;
  const comb: Array<{ x: number; y: number }> = [];
  for (let t = teeth - 1; t >= 0; t--) comb.push({ x: 104 + t * 8, y: 100 }, { x: 104 + t * 8, y: 500 }, { x: 100 + t * 8, y: 500 }, { x: 100 + t * 8, y: 100 });
  comb.push({ x: 100, y: 90 }, { x: 100 + teeth * 8, y: 90 });
  const combDoc = (lines: number) =>
    base(
      Array.from({ length: lines }, (_, i) => line(i, Array.from({ length: 200 }, (_, k) => ({ x: k % 2 ? 520 : 80, y: 120 + (k * 380) / 200 + i, bendRadiusIn: 0 })))),
      [{ id: 'comb', kind: 'exhaust', clearanceIn: 0.2, polygon: comb }],
      Math.max(lines, 1),
    );
  let n = 1;
  while (checkWorkBudget(combDoc(n + 1), defaultShopRules).ok) n++;
  return [
    { name: `${sharp.lines.length} lines × 200 sharp corners`, doc: sharp },
    { name: `${n} lines × 200 corners through a 200-point comb zone`, doc: combDoc(n) },
  ];
}

export async function benchRouting(): Promise<BenchRow[]> {
  const large = generateCircuit(300);
  const small = generateCircuit(30);
  const evaluate = (doc: CircuitDocument) => () => evaluateCircuit(doc, testParts, defaultShopRules);
  const largeMs = medianMs(evaluate(large), 41);
  const smallMs = medianMs(evaluate(small), 201);
  const ratio = largeMs / smallMs;

  // One-line edits through the incremental evaluator: each run drags one corner of another line.
  const evaluator = createEvaluator(testParts, defaultShopRules);
  evaluator.evaluate(large);
  const drags = Array.from({ length: 400 }, (_, i) => dragged(large, (i * 37) % large.lines.length, i % 2 ? 3 : -3));
  let next = 0;
  const incrementalMs = medianMs(() => evaluator.evaluate(drags[next++ % drags.length]), 395);

  const worst = worstAdmissible().map(({ name, doc }) => {
    if (!checkWorkBudget(doc, defaultShopRules).ok) throw new Error(`${name} is over the work budget`);
    return { name, ms: medianMs(evaluate(doc), 7) };
  });
  const worstMs = Math.max(...worst.map((w) => w.ms));
  const worstName = worst.find((w) => w.ms === worstMs)!.name;
  return [
    { name: 'evaluateCircuit, 300 lines / 60 units / 6,000 points', median: largeMs, unit: 'ms', goal: 5, ok: largeMs <= 5 },
    { name: 'evaluateCircuit, 30 lines / 6 units / 600 points', median: smallMs, unit: 'ms' },
    { name: 'scaling, 300 lines ÷ 30 lines', median: ratio, unit: 'ratio', goal: 11, ok: ratio <= 11 },
    { name: 'createEvaluator, one-line edit of the 300-line circuit', median: incrementalMs, unit: 'ms', goal: 0.3, ok: incrementalMs <= 0.3 },
    { name: `worst admissible document (${worstName})`, median: worstMs, unit: 'ms', goal: 200, ok: worstMs <= 200 },
  ];
}
