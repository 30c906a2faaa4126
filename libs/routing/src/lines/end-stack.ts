import type { ConnectionSpec, HoseEndPart, MateResult, Part } from '@linesmith/catalog';
import { mate } from '@linesmith/catalog';
import type { LineEnd } from '../rules/flag.js';

export type { MateResult };
export type Mater = (a: ConnectionSpec, b: ConnectionSpec) => MateResult;

/** mate() remembers its answers for one evaluation: a circuit repeats the same few connections. */
export function cachedMate(): Mater {
  // Keyed by the connection objects themselves (ports and parts are shared), then by value. Plain
  // Maps, not WeakMaps: the cache lives for one evaluation, and weak tables cost the GC extra.
  const byObject = new Map<ConnectionSpec, Map<ConnectionSpec, MateResult>>();
  const byValue = new Map<string, MateResult>();
  const key = (c: ConnectionSpec) => (c.seat === undefined ? `${c.family}|${c.size}|${c.gender}` : `${c.family}|${c.size}|${c.gender}|${c.seat}`);
  return (a, b) => {
    let row = byObject.get(a);
    let result = row?.get(b);
    if (result) return result;
    const k = `${key(a)}>${key(b)}`;
    result = byValue.get(k);
    if (!result) {
      result = mate(a, b);
      byValue.set(k, result);
    }
    if (!row) byObject.set(a, (row = new Map()));
    row.set(b, result);
    return result;
  };
}

export interface StackItem {
  partId: string;
  /** Position from the port outward. */
  index: number;
  part: Part | undefined;
}

/** One threaded joint of an end stack: joint i joins the port (i = 0) or part i−1 to part i. */
export interface StackJoint {
  index: number;
  inner: ConnectionSpec;
  outer: ConnectionSpec;
  partId: string;
  result: MateResult;
}

export interface ResolvedStack {
  end: LineEnd;
  items: StackItem[];
  joints: StackJoint[];
  /** How far the stack moves the hose's seal point away from the port face. */
  lengthIn: number;
  /** The hose end, when it is the last part. */
  hoseEnd: HoseEndPart | undefined;
  /** Ids not in the catalogue. */
  missingIds: string[];
  /** Parts that cannot sit in an end stack here (a clamp, a hose, a hose end that is not last…). */
  misplaced: StackItem[];
}

/**
 * Walks an end stack from the port outward: each adapter turns whichever of its sides joins the
 * exposed connection towards it (side a when neither does), and the hose end comes last.
 */
export function resolveEndStack(
  end: LineEnd,
  portConnection: ConnectionSpec | undefined,
  partIds: readonly string[],
  parts: ReadonlyMap<string, Part>,
  mateFn: Mater,
): ResolvedStack {
  const items: StackItem[] = partIds.map((partId, index) => ({ partId, index, part: parts.get(partId) }));
  const stack: ResolvedStack = { end, items, joints: [], lengthIn: 0, hoseEnd: undefined, missingIds: [], misplaced: [] };
  let exposed = portConnection;
  const join = (item: StackItem, side: ConnectionSpec) => {
    if (exposed) {
      stack.joints.push({ index: item.index, inner: exposed, outer: side, partId: item.partId, result: mateFn(exposed, side) });
    }
  };
  for (const item of items) {
    const { part } = item;
    if (!part) {
      stack.missingIds.push(item.partId);
      exposed = undefined; // the chain is broken; joints past an unknown part cannot be checked
      continue;
    }
    const isLast = item.index === items.length - 1;
    if (part.kind === 'adapter' || part.kind === 'bulkhead') {
      const sides = [part.attributes.a, part.attributes.b] as const;
      const flip = exposed !== undefined && !mateFn(exposed, sides[0]).ok && mateFn(exposed, sides[1]).ok;
      const [inner, outer] = flip ? [sides[1], sides[0]] : sides;
      join(item, inner);
      exposed = outer;
      stack.lengthIn += part.attributes.bodyLengthIn;
    } else if (part.kind === 'hose-end') {
      join(item, part.attributes.port);
      stack.lengthIn += part.attributes.allowanceIn;
      if (isLast) stack.hoseEnd = part;
      else stack.misplaced.push(item);
      exposed = undefined;
    } else if (part.kind !== 'seal') {
      stack.misplaced.push(item);
    }
  }
  return stack;
}
