import Flatbush from 'flatbush';
import type { CircuitDocument } from '../circuit/document.schema.js';
import { portPosition } from '../lines/port-position.js';
import type { ShopRules } from '../rules/shop-rules.js';
import { usableScaleOf } from './evaluate-circuit.js';

/**
 * How much work a check of a circuit will take, estimated before checking it, so the API can
 * refuse a document that would keep a server busy (and the editor can say so instead of
 * freezing). The schema's limits bound each list; this bounds their products:
 *
 * - corner-zone pairs: for each stretch of route (a leg and the bend at its end, as the chords the
 *   heat check walks), the heat-zone edges whose clearance box reaches it; and where the stretch
 *   reaches into a zone's own box, also the zone's edges times the edges whose boxes meet the
 *   stretch's (the inside test cuts a chord at every edge it crosses, and tests each piece against
 *   every edge of the zone). The heat check's cost, up to a constant.
 * - route points: corners and ports of all lines, and units' ports: every one is worked out and
 *   may carry a flag.
 *
 * The limits are set so that the worst document within them checks in well under 200 ms on the
 * benchmark machine (bench/: "worst admissible document").
 */
export const WORK_LIMITS = {
  cornerZonePairs: 8_000_000,
  routePoints: 16_000,
} as const;

export interface WorkEstimate {
  cornerZonePairs: number;
  routePoints: number;
}

export type WorkVerdict = { ok: true; estimate: WorkEstimate } | { ok: false; estimate: WorkEstimate; message: string };

/** Largest angle one chord of a bend spans (route-path.ts draws bends in pieces of at most 15°). */
const MAX_CHORD_RAD = Math.PI / 12;
/** Below this, a line's pairs are counted from its whole box; above, leg by leg (tighter). */
const COARSE_ENOUGH = 20_000;

const fmt = (n: number) => Math.round(n).toLocaleString('en-US');

/**
 * The work estimate of a document. Costs about one R-tree query per line (per leg for lines near
 * many zone edges): far less than the check itself, and it stops counting past `stopAbove`.
 */
export function estimateWork(doc: CircuitDocument, rules: ShopRules, stopAbove = Infinity): WorkEstimate {
  let routePoints = 0;
  for (const unit of doc.units) routePoints += unit.ports.length;
  for (const line of doc.lines) routePoints += line.points.length + 2;
  const scale = usableScaleOf(doc);
  if (scale === null || doc.heatZones.length === 0) return { cornerZonePairs: 0, routePoints };

  // Each zone's box grown by its clearance, in sketch pixels, and its edge count.
  const index = new Flatbush(doc.heatZones.length);
  const edges: number[] = [];
  const areas: number[] = [];
  for (const zone of doc.heatZones) {
    const grow = (zone.clearanceIn ?? rules.heatClearanceIn[zone.kind]) * scale;
    let minX = Infinity;
    let minY = Infinity;
    let maxX = -Infinity;
    let maxY = -Infinity;
    for (const p of zone.polygon) {
      if (p.x < minX) minX = p.x;
      if (p.y < minY) minY = p.y;
      if (p.x > maxX) maxX = p.x;
      if (p.y > maxY) maxY = p.y;
    }
    index.add(minX - grow, minY - grow, maxX + grow, maxY + grow);
    edges.push(zone.polygon.length);
    areas.push(minX, minY, maxX, maxY);
  }
  index.finish();
  /** Every zone edge's own box, and its zone: built when a leg is looked at on its own. */
  let edgeIndex: Flatbush | undefined;
  const zoneOfEdge: number[] = [];
  const crossings = new Map<number, number>();
  const costIn = (minX: number, minY: number, maxX: number, maxY: number, fine: boolean) => {
    let sum = 0;
    let inside = false;
    const near = index.search(minX, minY, maxX, maxY);
    for (const z of near) {
      const n = edges[z];
      const a = 4 * z;
      if (maxX >= areas[a] && minX <= areas[a + 2] && maxY >= areas[a + 1] && minY <= areas[a + 3]) {
        inside = true;
        if (!fine) sum += n * n; // at most every edge crossed
      }
      sum += n;
    }
    if (!inside || !fine) return sum;
    if (!edgeIndex) {
      edgeIndex = new Flatbush(doc.heatZones.reduce((count, z) => count + z.polygon.length, 0));
      doc.heatZones.forEach((zone, z) => {
        zone.polygon.forEach((e, i) => {
          const f = zone.polygon[(i + 1) % zone.polygon.length];
          edgeIndex!.add(Math.min(e.x, f.x), Math.min(e.y, f.y), Math.max(e.x, f.x), Math.max(e.y, f.y));
          zoneOfEdge.push(z);
        });
      });
      edgeIndex.finish();
    }
    crossings.clear();
    for (const e of edgeIndex.search(minX, minY, maxX, maxY)) crossings.set(zoneOfEdge[e], (crossings.get(zoneOfEdge[e]) ?? 0) + 1);
    for (const [z, m] of crossings) sum += edges[z] * (m + 1);
    return sum;
  };

  const ports = new Map<string, { x: number; y: number }>();
  for (const unit of doc.units) for (const port of unit.ports) ports.set(`${unit.id}/${port.id}`, portPosition(unit, port));
  let pairs = 0;
  const xs: number[] = [];
  const ys: number[] = [];
  const rs: number[] = [];
  for (const line of doc.lines) {
    const from = ports.get(`${line.from.unitId}/${line.from.portId}`);
    const to = ports.get(`${line.to.unitId}/${line.to.portId}`);
    if (!from || !to) continue;
    xs.length = ys.length = rs.length = 0;
    xs.push(from.x);
    ys.push(from.y);
    rs.push(0);
    for (const p of line.points) {
      xs.push(p.x);
      ys.push(p.y);
      rs.push(p.bendRadiusIn * scale);
    }
    xs.push(to.x);
    ys.push(to.y);
    rs.push(0);
    // Chords per leg: the straight, and the pieces of the bend at its far end.
    const chords: number[] = [];
    let total = 0;
    let minX = Infinity;
    let minY = Infinity;
    let maxX = -Infinity;
    let maxY = -Infinity;
    let bulge = 0;
    for (let i = 0; i < xs.length; i++) {
      minX = Math.min(minX, xs[i]);
      minY = Math.min(minY, ys[i]);
      maxX = Math.max(maxX, xs[i]);
      maxY = Math.max(maxY, ys[i]);
      bulge = Math.max(bulge, rs[i]);
      if (i === 0) continue;
      let pieces = 1;
      if (i < xs.length - 1 && rs[i] > 0) {
        const ix = xs[i] - xs[i - 1];
        const iy = ys[i] - ys[i - 1];
        const ox = xs[i + 1] - xs[i];
        const oy = ys[i + 1] - ys[i];
        pieces += Math.max(1, Math.ceil(Math.atan2(Math.abs(ix * oy - iy * ox), ix * ox + iy * oy) / MAX_CHORD_RAD));
      }
      chords.push(pieces);
      total += pieces;
    }
    const coarse = total * costIn(minX - bulge, minY - bulge, maxX + bulge, maxY + bulge, false);
    if (coarse <= COARSE_ENOUGH) {
      pairs += coarse;
    } else {
      for (let i = 1; i < xs.length; i++) {
        const grow = Math.max(rs[i - 1], rs[i]);
        pairs +=
          chords[i - 1] *
          costIn(Math.min(xs[i - 1], xs[i]) - grow, Math.min(ys[i - 1], ys[i]) - grow, Math.max(xs[i - 1], xs[i]) + grow, Math.max(ys[i - 1], ys[i]) + grow, true);
      }
    }
    if (pairs > stopAbove) break;
  }
  return { cornerZonePairs: pairs, routePoints };
}

/** Whether a document is within the work limits, with the words to refuse it when it is not. */
export function checkWorkBudget(doc: CircuitDocument, rules: ShopRules, limits: { cornerZonePairs: number; routePoints: number } = WORK_LIMITS): WorkVerdict {
  const estimate = estimateWork(doc, rules, limits.cornerZonePairs);
  if (estimate.cornerZonePairs > limits.cornerZonePairs) {
    const counted = estimate.cornerZonePairs;
    return {
      ok: false,
      estimate,
      message: `This circuit is too complex to check: ${fmt(counted)}${counted > limits.cornerZonePairs ? ' or more' : ''} corner-zone pairs, the limit is ${fmt(limits.cornerZonePairs)}. Simplify the heat zones (fewer points) or the routes that run near them.`,
    };
  }
  if (estimate.routePoints > limits.routePoints) {
    return {
      ok: false,
      estimate,
      message: `This circuit is too complex to check: ${fmt(estimate.routePoints)} route points and ports, the limit is ${fmt(limits.routePoints)}. Split it into several circuits or draw routes with fewer corners.`,
    };
  }
  return { ok: true, estimate };
}
