import type { ConnectionSpec } from '../connections.js';
import type { Part, PartOf } from '../parts/part.schema.js';
import { connectionKey, matingKeys } from './connection-key.js';

/** Parts that sit between a port and a hose end: adapters, and bulkheads used as adapters. */
export type ChainPart = PartOf<'adapter'> | PartOf<'bulkhead'>;

/** Which side of a chain part faces the port. */
export type Orientation = 'a-to-port' | 'b-to-port';

/** A chain part in one orientation: enters by `inward` (port side), leaves by `outward`. */
export interface Edge {
  part: ChainPart;
  orientation: Orientation;
  inward: ConnectionSpec;
  outward: ConnectionSpec;
  /** Keys worked out once per catalogue, so the search only does map look-ups. */
  inwardKey: string;
  outwardKey: string;
  /** Keys of the ends that mate with `inward` / `outward`; empty when nothing can. */
  inwardMatingKeys: readonly string[];
  outwardMatingKeys: readonly string[];
}

export interface AdapterIndex {
  /** Edges by the key of their port-side end. */
  byInward: Map<string, Edge[]>;
  /** Edges by the key of their outward end. */
  byOutward: Map<string, Edge[]>;
}

// One index per parts array: catalogues are immutable arrays, replaced when the catalogue changes.
const cache = new WeakMap<readonly Part[], AdapterIndex>();

function push(map: Map<string, Edge[]>, key: string, edge: Edge): void {
  const list = map.get(key);
  if (list) list.push(edge);
  else map.set(key, [edge]);
}

export function isChainPart(part: Part): part is ChainPart {
  return part.kind === 'adapter' || part.kind === 'bulkhead';
}

export function adapterIndex(parts: readonly Part[]): AdapterIndex {
  const cached = cache.get(parts);
  if (cached) return cached;
  const index: AdapterIndex = { byInward: new Map(), byOutward: new Map() };
  for (const part of parts) {
    if (!isChainPart(part)) continue;
    const { a, b } = part.attributes;
    const keyA = connectionKey(a);
    const keyB = connectionKey(b);
    const matingA = matingKeys(a);
    const matingB = matingKeys(b);
    const edges: Edge[] = [
      { part, orientation: 'a-to-port', inward: a, outward: b, inwardKey: keyA, outwardKey: keyB, inwardMatingKeys: matingA, outwardMatingKeys: matingB },
      { part, orientation: 'b-to-port', inward: b, outward: a, inwardKey: keyB, outwardKey: keyA, inwardMatingKeys: matingB, outwardMatingKeys: matingA },
    ];
    // A part with two identical ends gives the same chain both ways round: keep one.
    const distinct = keyA === keyB ? edges.slice(0, 1) : edges;
    for (const edge of distinct) {
      push(index.byInward, edge.inwardKey, edge);
      push(index.byOutward, edge.outwardKey, edge);
    }
  }
  cache.set(parts, index);
  return index;
}
