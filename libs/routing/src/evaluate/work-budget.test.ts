import { describe, expect, it } from 'vitest';
import type { CircuitDocument } from '../circuit/document.schema.js';
import { defaultShopRules } from '../rules/shop-rules.js';
import { coolerCircuit } from '../test-support/fixtures.js';
import { checkWorkBudget, estimateWork, WORK_LIMITS } from './work-budget.js';

/** A zone of `points` points around (cx, cy), radius r px. */
const zone = (id: string, cx: number, cy: number, r: number, points: number) => ({
  id,
  label: '',
  kind: 'exhaust' as const,
  polygon: Array.from({ length: points }, (_, k) => ({ x: cx + r * Math.cos((2 * Math.PI * k) / points), y: cy + r * Math.sin((2 * Math.PI * k) / points) })),
});

describe('work budget', () => {
  it('counts no corner-zone pairs without zones, and the route points and ports', () => {
    const doc = coolerCircuit();
    expect(estimateWork(doc, defaultShopRules)).toEqual({ cornerZonePairs: 0, routePoints: 4 + 2 * 2 });
    expect(checkWorkBudget(doc, defaultShopRules).ok).toBe(true);
  });

  it('counts the edges of a zone a straight line passes near, and nothing for a far one', () => {
    // L1 runs from (0, 0) to (300, 0) px; one leg, no bends.
    const near = { ...coolerCircuit(), heatZones: [zone('z', 150, 30, 20, 8)] };
    const far = { ...coolerCircuit(), heatZones: [zone('z', 150, 3000, 20, 8)] };
    expect(estimateWork(near, defaultShopRules).cornerZonePairs).toBeGreaterThanOrEqual(8);
    expect(estimateWork(far, defaultShopRules).cornerZonePairs).toBe(0);
  });

  it('refuses a circuit of 30 lines × 200 corners among 200 zones × 200 points with the counts and the limit', () => {
    const base = coolerCircuit();
    const corners = Array.from({ length: 200 }, (_, k) => ({ x: (k * 37) % 2000, y: (k * 53) % 800, bendRadiusIn: 3 }));
    const doc: CircuitDocument = {
      ...base,
      lines: base.lines.map((l) => ({ ...l, points: corners })),
      heatZones: Array.from({ length: 200 }, (_, z) => zone(`z${z}`, (z * 97) % 2000, (z * 41) % 800, 60, 200)),
    };
    const verdict = checkWorkBudget(doc, defaultShopRules);
    expect(verdict.ok).toBe(false);
    if (verdict.ok) return;
    expect(verdict.message).toMatch(/^This circuit is too complex to check: [\d,]+( or more)? corner-zone pairs, the limit is 8,000,000\./);
    expect(verdict.estimate.cornerZonePairs).toBeGreaterThan(WORK_LIMITS.cornerZonePairs);
  });

  it('refuses too many route points', () => {
    const base = coolerCircuit();
    const corners = Array.from({ length: 200 }, (_, k) => ({ x: k, y: k % 2, bendRadiusIn: 0 }));
    const doc: CircuitDocument = { ...base, lines: base.lines.map((l) => ({ ...l, points: corners })) };
    expect(checkWorkBudget(doc, defaultShopRules, { cornerZonePairs: 1e9, routePoints: 300 })).toMatchObject({
      ok: false,
      message: expect.stringContaining('408 route points and ports, the limit is 300'),
    });
  });
});
