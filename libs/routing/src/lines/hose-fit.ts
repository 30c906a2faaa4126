import type { HosePart } from '@linesmith/catalog';
import type { ShopRules } from '../rules/shop-rules.js';
import type { LineEnd } from '../rules/flag.js';
import type { LineAnalysis } from './analyse-line.js';
import type { ResolvedStack } from './end-stack.js';

/** Below this deflection a corner point is a straight run, not a bend. */
export const STRAIGHT_RAD = 1e-6;

export type BendRadiusBasis = 'inside' | 'centreline';

export interface BendRadiusCheck {
  centrelineIn: number;
  /** Centreline radius − half the hose OD: the radius of the bend's innermost surface. */
  insideIn: number;
  /** The hose's minimum, and which radius its maker quotes it to. */
  minIn: number;
  basis: BendRadiusBasis;
  /** The radius compared with the minimum: the inside one unless the maker quotes the centreline. */
  comparedIn: number;
}

/**
 * A bend of centreline radius R on a hose: hose makers quote the minimum bend radius to the inside
 * of the bend (SAE J517 and makers' data), so R − OD/2 is compared unless the hose's maker quotes
 * the centreline (`minBendRadiusMeasuredTo`, per hose in the catalogue).
 */
export function bendRadiusCheck(centrelineIn: number, hose: HosePart): BendRadiusCheck {
  const basis: BendRadiusBasis = hose.attributes.minBendRadiusMeasuredTo ?? 'inside';
  const insideIn = centrelineIn - hose.attributes.odIn / 2;
  return {
    centrelineIn,
    insideIn,
    minIn: hose.attributes.minBendRadiusIn,
    basis,
    comparedIn: basis === 'inside' ? insideIn : centrelineIn,
  };
}

export interface RigidEnd {
  end: LineEnd;
  /** Adapter and bulkhead bodies from the port face. */
  adaptersIn: number;
  /** The hose end from its seal point to where the hose leaves the socket (the allowance when the part gives no rigid length). */
  hoseEndIn: number;
  /** True when the hose end gives no rigid length, so its allowance stood in (a lower bound). */
  hoseEndEstimated: boolean;
  /** adaptersIn + hoseEndIn: nothing bends in this length from the port face. */
  rigidIn: number;
  /** The shop's straight stretch past the socket: straightAfterSocketOd × hose OD (0 without a hose). */
  straightIn: number;
  /** Along the drawn route from this end's port face to where the nearest bend starts; null when the route has no bend. */
  firstBendStartIn: number | null;
  /** The corner (0-based, as the inspector numbers them from 1) of that bend. */
  firstBendCorner: number | null;
}

export interface HoseFit {
  from: RigidEnd;
  to: RigidEnd;
  /** Hose between the two sockets: length + slack − both rigid lengths; null without a length. */
  freeHoseIn: number | null;
}

function rigidOf(stack: ResolvedStack): Omit<RigidEnd, 'end' | 'straightIn' | 'firstBendStartIn' | 'firstBendCorner'> {
  let adaptersIn = 0;
  for (const item of stack.items) {
    const part = item.part;
    if (part && (part.kind === 'adapter' || part.kind === 'bulkhead')) adaptersIn += part.attributes.bodyLengthIn;
  }
  const hoseEnd = stack.hoseEnd;
  const given = hoseEnd?.attributes.rigidLengthIn;
  const hoseEndIn = hoseEnd ? (given ?? hoseEnd.attributes.allowanceIn) : 0;
  return { adaptersIn, hoseEndIn, hoseEndEstimated: !!hoseEnd && given === undefined, rigidIn: adaptersIn + hoseEndIn };
}

/** Where the nearest real bend starts, measured along the drawn route from one end's port face. */
function firstBend(line: LineAnalysis, end: LineEnd): { startIn: number; corner: number } | null {
  const detail = line.centreline;
  if (!detail) return null;
  const { bends, legsIn } = detail;
  const order = end === 'from' ? bends.map((_, i) => i) : bends.map((_, i) => bends.length - 1 - i);
  for (const k of order) {
    const bend = bends[k];
    if (bend.deflectionRad < STRAIGHT_RAD) continue;
    // Bend k sits at corner point k + 1 of the merged route: legs 0..k lie before it, legs k+1.. after it.
    let straight = 0;
    if (end === 'from') for (let j = 0; j <= k; j++) straight += legsIn[j];
    else for (let j = k + 1; j < legsIn.length; j++) straight += legsIn[j];
    return { startIn: straight - bend.tangentIn, corner: bend.pointIndex - 1 };
  }
  return null;
}

const cache = new WeakMap<LineAnalysis, { rules: ShopRules; fit: HoseFit }>();

/** Rigid lengths at both ends, the nearest bends and the free hose of one line (worked once per evaluation). */
export function hoseFit(line: LineAnalysis, rules: ShopRules): HoseFit {
  const hit = cache.get(line);
  if (hit && hit.rules === rules) return hit.fit;
  const od = line.hose?.attributes.odIn ?? 0;
  const endOf = (end: LineEnd): RigidEnd => {
    const bend = firstBend(line, end);
    return {
      end,
      ...rigidOf(line.stacks[end]),
      straightIn: rules.straightAfterSocketOd * od,
      firstBendStartIn: bend?.startIn ?? null,
      firstBendCorner: bend?.corner ?? null,
    };
  };
  const from = endOf('from');
  const to = endOf('to');
  const { basis, measuredLengthIn, centrelineIn, slackIn } = line.report;
  const lengthIn = basis === 'measured' ? measuredLengthIn : basis === 'drawn' ? centrelineIn : null;
  const fit: HoseFit = { from, to, freeHoseIn: lengthIn === null ? null : lengthIn + slackIn - from.rigidIn - to.rigidIn };
  cache.set(line, { rules, fit });
  return fit;
}
