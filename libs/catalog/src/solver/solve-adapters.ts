import { z } from 'zod';
import { connectionSpecSchema, type ConnectionSpec } from '../connections.js';
import { mate } from '../mating/mate.js';
import type { MateResult } from '../mating/mate-result.js';
import type { Part } from '../parts/part.schema.js';
import { adapterIndex, type ChainPart, type Edge, type Orientation } from './adapter-index.js';
import { connectionKey, matingKeys } from './connection-key.js';
import { MinHeap } from './min-heap.js';
import { meetsRequirement, portRequirementSchema } from './port-requirement.js';

export const solveOptionsSchema = z.object({
  /** Most parts in one chain. */
  maxParts: z.number().int().min(0).max(6).default(3),
  /** The port's requirement; the part in the port must meet it (a 0-part chain cannot). */
  requirement: portRequirementSchema.optional(),
  /** Most chains returned. */
  limit: z.number().int().positive().max(100).default(10),
  excludeRetired: z.boolean().default(true),
});
export type SolveOptions = z.input<typeof solveOptionsSchema>;

/** Parts from the port outward that join a port to a hose end, with every joint checked. */
export interface AdapterChain {
  parts: ChainPart[];
  /** Per part, which of its ends faces the port. */
  orientations: Orientation[];
  /** port↔first part, between parts, last part↔hose end side (one joint when no parts). */
  joints: MateResult[];
  partCount: number;
  /** Joints that join but carry a caution (NPTF into NPT, a taper male into a parallel female). */
  cautionCount: number;
  /** Smallest bore along the chain in inches; null when the chain has no parts. */
  minBoreIn: number | null;
  priceCents: number;
  /** How far the chain moves the hose end's seal point away from the port, in. */
  bodyLengthIn: number;
}

interface SearchNode {
  parent: SearchNode | undefined;
  edge: Edge | undefined;
  state: ConnectionSpec;
  stateKey: string;
  /** Keys of the ends that mate with `state`. */
  stateMatingKeys: readonly string[];
  count: number;
  /** Joints so far that join across families (mate() answers those with a caution). */
  cautions: number;
  /** Lower bound on the final part count: count + parts still needed. */
  bound: number;
  minBoreIn: number;
  priceCents: number;
  complete: boolean;
  seq: number;
}

/**
 * Ranking: fewer parts, then fewer cautioned joints, then the larger smallest bore, then the lower
 * price. Cautions and price only grow and the bore only shrinks along a path, so best-first
 * order over partial chains is also the order of the finished ones.
 */
function byRank(x: SearchNode, y: SearchNode): number {
  return x.bound - y.bound || x.cautions - y.cautions || y.minBoreIn - x.minBoreIn || x.priceCents - y.priceCents || x.seq - y.seq;
}

export function compareChains(x: AdapterChain, y: AdapterChain): number {
  const boreX = x.minBoreIn ?? Number.POSITIVE_INFINITY;
  const boreY = y.minBoreIn ?? Number.POSITIVE_INFINITY;
  if (x.partCount !== y.partCount) return x.partCount - y.partCount;
  if (x.cautionCount !== y.cautionCount) return x.cautionCount - y.cautionCount;
  if (boreX !== boreY) return boreY - boreX;
  return x.priceCents - y.priceCents;
}

/** Fewest parts still needed from each outward end to reach the hose end, up to maxParts. */
function distancesToGoal(
  goalKeys: readonly string[],
  byOutward: Map<string, Edge[]>,
  maxParts: number,
  usable: (edge: Edge) => boolean,
): Map<string, number> {
  const dist = new Map<string, number>(goalKeys.map((k) => [k, 0]));
  let frontier = [...goalKeys];
  for (let d = 1; d <= maxParts && frontier.length > 0; d += 1) {
    const next: string[] = [];
    for (const key of frontier) {
      for (const edge of byOutward.get(key) ?? []) {
        if (!usable(edge)) continue;
        for (const before of edge.inwardMatingKeys) {
          if (!dist.has(before)) {
            dist.set(before, d);
            next.push(before);
          }
        }
      }
    }
    frontier = next;
  }
  return dist;
}

function onPath(node: SearchNode, key: string): boolean {
  for (let n: SearchNode | undefined = node; n; n = n.parent) if (n.stateKey === key) return true;
  return false;
}

function toChain(node: SearchNode, port: ConnectionSpec, hoseEndSide: ConnectionSpec): AdapterChain | undefined {
  const edges: Edge[] = [];
  for (let n: SearchNode | undefined = node; n?.edge; n = n.parent) edges.unshift(n.edge);
  const joints: MateResult[] = [];
  let outward = port;
  for (const edge of edges) {
    joints.push(mate(outward, edge.inward));
    outward = edge.outward;
  }
  joints.push(mate(outward, hoseEndSide));
  // The index mirrors mate(); this keeps the promise even if the two ever drift apart.
  if (!joints.every((joint) => joint.ok)) return undefined;
  return {
    parts: edges.map((e) => e.part),
    orientations: edges.map((e) => e.orientation),
    joints,
    partCount: edges.length,
    cautionCount: joints.filter((joint) => joint.caution !== undefined).length,
    minBoreIn: edges.length === 0 ? null : node.minBoreIn,
    priceCents: node.priceCents,
    bodyLengthIn: edges.reduce((sum, e) => sum + e.part.attributes.bodyLengthIn, 0),
  };
}

/**
 * Chains of catalogue adapters (and bulkheads) joining a port to a hose end's port-side end,
 * best first (DOMAIN.md §2, Adapter solver). Best-first search over connection ends with an
 * exact "parts still needed" bound from a backward breadth-first pass, so it stops as soon as
 * `limit` chains are found instead of enumerating every combination.
 */
export function solveAdapters(
  port: ConnectionSpec,
  hoseEndSide: ConnectionSpec,
  parts: readonly Part[],
  options: SolveOptions = {},
): AdapterChain[] {
  const opts = solveOptionsSchema.parse(options);
  connectionSpecSchema.parse(port);
  connectionSpecSchema.parse(hoseEndSide);
  const goalKeys = matingKeys(hoseEndSide);
  if (goalKeys.length === 0) return [];
  const goals = new Set(goalKeys);
  const index = adapterIndex(parts);
  const usable = (edge: Edge) => !(opts.excludeRetired && edge.part.retired);
  const dist = distancesToGoal(goalKeys, index.byOutward, opts.maxParts, usable);
  const portKey = connectionKey(port);
  const portDist = dist.get(portKey);
  if (portDist === undefined) return [];

  const requirement = opts.requirement;
  let seq = 0;
  const heap = new MinHeap<SearchNode>(byRank);
  heap.push({
    parent: undefined,
    edge: undefined,
    state: port,
    stateKey: portKey,
    stateMatingKeys: matingKeys(port),
    count: 0,
    cautions: 0,
    bound: requirement ? Math.max(portDist, 1) : portDist,
    minBoreIn: Number.POSITIVE_INFINITY,
    priceCents: 0,
    complete: false,
    seq: seq++,
  });

  const chains: AdapterChain[] = [];
  for (let node = heap.pop(); node && chains.length < opts.limit; node = heap.pop()) {
    if (node.complete) {
      const chain = toChain(node, port, hoseEndSide);
      if (chain) chains.push(chain);
      continue;
    }
    if (goals.has(node.stateKey) && !(requirement && node.count === 0)) {
      const cautions = node.cautions + (node.state.family === hoseEndSide.family ? 0 : 1);
      heap.push({ ...node, complete: true, bound: node.count, cautions, seq: seq++ });
    }
    if (node.count >= opts.maxParts) continue;
    for (const wanted of node.stateMatingKeys) {
      for (const edge of index.byInward.get(wanted) ?? []) {
        if (!usable(edge)) continue;
        if (node.count === 0 && requirement && !meetsRequirement(edge.part, requirement)) continue;
        const nextKey = edge.outwardKey;
        const remaining = dist.get(nextKey);
        if (remaining === undefined || node.count + 1 + remaining > opts.maxParts) continue;
        if (onPath(node, nextKey)) continue;
        heap.push({
          parent: node,
          edge,
          state: edge.outward,
          stateKey: nextKey,
          stateMatingKeys: edge.outwardMatingKeys,
          count: node.count + 1,
          cautions: node.cautions + (edge.inward.family === node.state.family ? 0 : 1),
          bound: node.count + 1 + remaining,
          minBoreIn: Math.min(node.minBoreIn, edge.part.attributes.boreIn),
          priceCents: node.priceCents + edge.part.priceCents,
          complete: false,
          seq: seq++,
        });
      }
    }
  }
  return chains.sort(compareChains);
}
