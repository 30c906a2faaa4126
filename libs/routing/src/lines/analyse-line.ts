import type { HosePart, Part } from '@linesmith/catalog';
import { fitsOd } from '@linesmith/catalog';
import type { CircuitLine } from '../circuit/document.schema.js';
import type { CentrelineDetail } from '../geometry/centreline.js';
import { fillPackedRoutePath, packCentreline, type PackedCentreline } from '../geometry/centreline-packed.js';
import { subtractIntervals, totalLength, type Interval } from '../geometry/intervals.js';
import type { RoutePath } from '../geometry/route-path.js';
import { supportSpacingFor, type ShopRules } from '../rules/shop-rules.js';
import { cutLength, cutLengthTolerance, requiredSlack, type SlackRule } from './cut-length.js';
import { resolveEndStack, type Mater, type ResolvedStack } from './end-stack.js';
import { heatExposure, type HeatExposure, type prepareZones } from './heat.js';
import type { LineReport, PlacedSleeve, SleeveProblem } from './line-report.js';
import type { PortEntry } from './port-entry.js';
import { proposeSupports, unsupportedSpans } from './supports.js';

export type HoseStatus = 'none' | 'missing' | 'not-a-hose' | 'ok';

export interface LineAnalysis {
  line: CircuitLine;
  from: PortEntry | undefined;
  to: PortEntry | undefined;
  hose: HosePart | undefined;
  hoseStatus: HoseStatus;
  stacks: { from: ResolvedStack; to: ResolvedStack };
  /** Route in inches; null without calibration or without both ports. */
  centreline: CentrelineDetail | null;
  heat: HeatExposure | null;
  requiredSlackIn: number;
  report: LineReport;
}

export interface LineEnvironment {
  parts: ReadonlyMap<string, Part>;
  clamps: readonly Part[];
  rules: ShopRules;
  pxPerIn: number | null;
  zones: ReturnType<typeof prepareZones>;
  ports: ReadonlyMap<string, PortEntry>;
  mate: Mater;
}

/** Relative length difference below which the path and the drawn basis count as the same length. */
const STRETCH_NOISE = 1e-12;

/** Each line's route path, overwritten by the next line: only the heat check and the stretch read it. */
const SCRATCH_PATH: RoutePath = { xs: [], ys: [], s: [], count: 0, lengthIn: 0 };
/** Each line's route in inches (ports and corners), overwritten by the next line. */
let routeXs: Float64Array = new Float64Array(256);
let routeYs: Float64Array = new Float64Array(256);
let routeRadii: Float64Array = new Float64Array(256);

export const portKey = (unitId: string, portId: string): string => `${unitId}/${portId}`;

/** Works out one line: its route, end stacks, cut length, supports and heat exposure. */
export function analyseLine(line: CircuitLine, env: LineEnvironment): LineAnalysis {
  const { rules } = env;
  const from = env.ports.get(portKey(line.from.unitId, line.from.portId));
  const to = env.ports.get(portKey(line.to.unitId, line.to.portId));
  const hosePart = line.hosePartId === null ? undefined : env.parts.get(line.hosePartId);
  const hose = hosePart?.kind === 'hose' ? hosePart : undefined;
  const hoseStatus: HoseStatus =
    line.hosePartId === null ? 'none' : !hosePart ? 'missing' : hose ? 'ok' : 'not-a-hose';
  const stacks = {
    from: resolveEndStack('from', from?.port.connection, line.endStacks.from, env.parts, env.mate),
    to: resolveEndStack('to', to?.port.connection, line.endStacks.to, env.parts, env.mate),
  };

  let centreline: CentrelineDetail | null = null;
  let packed: PackedCentreline | null = null;
  let drawnLengthIn: number | null = null;
  if (env.pxPerIn !== null && from && to) {
    const perIn = env.pxPerIn;
    // The route in inches goes into flat scratch arrays: this runs for every line of every evaluation.
    const n = line.points.length + 2;
    if (routeXs.length < n) {
      routeXs = new Float64Array(2 * n);
      routeYs = new Float64Array(2 * n);
      routeRadii = new Float64Array(2 * n);
    }
    routeXs[0] = from.positionPx.x / perIn;
    routeYs[0] = from.positionPx.y / perIn;
    routeRadii[0] = 0;
    for (let i = 0; i < line.points.length; i++) {
      const p = line.points[i];
      routeXs[i + 1] = p.x / perIn;
      routeYs[i + 1] = p.y / perIn;
      routeRadii[i + 1] = p.bendRadiusIn;
    }
    routeXs[n - 1] = to.positionPx.x / perIn;
    routeYs[n - 1] = to.positionPx.y / perIn;
    routeRadii[n - 1] = 0;
    centreline = packed = packCentreline(routeXs, routeYs, routeRadii, n);
    let drawn = 0;
    for (let i = 1; i < n; i++) {
      const dx = routeXs[i - 1] - routeXs[i];
      const dy = routeYs[i - 1] - routeYs[i];
      drawn += Math.sqrt(dx * dx + dy * dy);
    }
    drawnLengthIn = drawn;
  }
  const measuredLengthIn = line.measuredLengthIn ?? null;
  const centrelineIn = centreline?.lengthIn ?? null;
  const basisIn = measuredLengthIn ?? centrelineIn;
  const basis = measuredLengthIn !== null ? 'measured' : centrelineIn !== null ? 'drawn' : null;

  const crossesMounts = !!from && !!to && from.unit.mountGroup !== to.unit.mountGroup;
  // Every line gets slack (hose shortens under pressure on any mount): max(minimum for the mount case, % × length).
  const need = basisIn === null ? null : requiredSlack(basisIn, rules, crossesMounts);
  const requiredSlackIn = need?.requiredIn ?? 0;
  const override = line.slackOverrideIn ?? null;
  const slackIn = override ?? requiredSlackIn;
  const slackRule: SlackRule | null = override !== null ? 'override' : (need?.rule ?? null);

  let exactCutIn: number | null = null;
  let cutLengthIn: number | null = null;
  if (basisIn !== null) {
    const cut = cutLength({
      overallIn: basisIn,
      endStackFromIn: stacks.from.lengthIn,
      endStackToIn: stacks.to.lengthIn,
      slackIn,
      roundingIn: rules.cutRoundingIn,
    });
    exactCutIn = cut.exactCutIn;
    cutLengthIn = cut.exactCutIn > 0 ? cut.cutLengthIn : null;
  }

  // Positions along the line are in the basis length; a measured line stretches the drawn one evenly.
  const path = packed ? fillPackedRoutePath(packed, SCRATCH_PATH) : null;
  const rawHeat = path ? heatExposure(path, env.zones, rules.sleeveOverlapIn) : null;
  const stretch = path && basisIn !== null && path.lengthIn > 0 ? basisIn / path.lengthIn : 1;
  // A drawn basis equals the path length up to rounding: only a real stretch is worth new intervals.
  const heat = rawHeat && Math.abs(stretch - 1) > STRETCH_NOISE ? stretchHeat(rawHeat, stretch) : rawHeat;

  const lengthForSupports = basisIn ?? 0;
  const supportsAt: Array<{ id: string; atIn: number }> = [];
  const supportPositions: number[] = [];
  for (const s of line.supports) {
    supportsAt.push({ id: s.id, atIn: s.atIn });
    supportPositions.push(s.atIn);
  }
  const spans = basisIn === null ? [] : unsupportedSpans(lengthForSupports, supportPositions);
  const placed: PlacedSleeve[] = [];
  for (const s of line.sleeves) {
    const problem = sleeveProblem(s.partId, env.parts, hose);
    const sleeve: PlacedSleeve = { id: s.id, startIn: s.startIn, endIn: s.endIn, lengthIn: s.endIn - s.startIn, partId: s.partId, covers: !problem };
    if (problem) sleeve.problem = problem;
    placed.push(sleeve);
  }
  const requiredIn = heat?.required ?? [];
  const plannedIn = heat?.planned ?? [];

  const report: LineReport = {
    lineId: line.id,
    hosePartId: line.hosePartId,
    drawnLengthIn,
    measuredLengthIn,
    centrelineIn,
    basis,
    endStackFromIn: stacks.from.lengthIn,
    endStackToIn: stacks.to.lengthIn,
    crossesMounts,
    slackIn,
    requiredSlackIn,
    slackRule,
    exactCutIn,
    cutLengthIn,
    toleranceIn: cutLengthIn === null ? null : cutLengthTolerance(cutLengthIn),
    fits: centreline?.fits ?? true,
    supports: {
      atIn: supportsAt,
      spans,
      longestSpanIn: spans.reduce((m, s) => Math.max(m, s.lengthIn), 0),
      proposedAtIn: basisIn === null ? [] : proposeSupports(basisIn, supportSpacingFor(hose?.attributes.dash, rules)),
    },
    sleeves: {
      requiredIn,
      plannedIn,
      plannedLengthIn: totalLength(plannedIn),
      placed,
      uncoveredIn: subtractIntervals(
        requiredIn,
        placed.filter((s) => s.covers).map((s) => ({ start: s.startIn, end: s.endIn })),
        1e-6,
      ),
      contact: heat?.contact ?? false,
      zoneIds: heat?.zones.map((z) => z.zoneId) ?? [],
    },
  };
  const clamp = hose ? pickClamp(env.clamps, hose.attributes.odIn) : undefined;
  if (clamp) report.clampPartId = clamp.id;
  return { line, from, to, hose, hoseStatus, stacks, centreline, heat, requiredSlackIn, report };
}

/** Only a catalogue sleeve that fits the hose's outside diameter shields it from heat. */
function sleeveProblem(partId: string | null, parts: ReadonlyMap<string, Part>, hose: HosePart | undefined): SleeveProblem | undefined {
  if (partId === null) return 'no-part';
  const part = parts.get(partId);
  if (!part) return 'missing';
  if (part.kind !== 'sleeve') return 'not-a-sleeve';
  if (!hose) return 'no-hose';
  return fitsOd(part, hose.attributes.odIn) ? undefined : 'does-not-fit';
}

function stretchHeat(heat: HeatExposure, k: number): HeatExposure {
  const scaleAll = (list: Interval[]) => list.map((i) => ({ start: i.start * k, end: i.end * k }));
  return {
    zones: heat.zones.map((z) => ({ ...z, near: scaleAll(z.near) })),
    required: scaleAll(heat.required),
    planned: scaleAll(heat.planned),
    contact: heat.contact,
  };
}

/** The tightest-fitting clamp for a hose OD, the cheaper one on a tie. */
function pickClamp(clamps: readonly Part[], odIn: number): Part | undefined {
  let best: Part | undefined;
  let bestWidth = Infinity;
  for (const clamp of clamps) {
    if (clamp.kind !== 'clamp' || !fitsOd(clamp, odIn)) continue;
    const width = clamp.attributes.fitsOd.maxIn - clamp.attributes.fitsOd.minIn;
    if (width < bestWidth || (width === bestWidth && best && clamp.priceCents < best.priceCents)) {
      best = clamp;
      bestWidth = width;
    }
  }
  return best;
}
