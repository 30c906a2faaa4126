import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { defaultShopRules } from '../rules/shop-rules.js';
import { cutLength, cutLengthTolerance, requiredSlack, roundCutUp } from './cut-length.js';
import { SKETCH_LIMITS } from '../circuit/document.schema.js';
import { proposeSupports, unsupportedSpans } from './supports.js';

describe('cut length', () => {
  it('is the overall length less the two cut-off allowances (hose makers’ assembly practice)', () => {
    // Overall 24 in, a straight end with 0.75 in and an adapter (0.5 in) plus a 0.75 in end: 24 − 0.75 − 1.25 = 22.
    const { exactCutIn, cutLengthIn } = cutLength({ overallIn: 24, endStackFromIn: 0.75, endStackToIn: 1.25, slackIn: 0, roundingIn: 0.125 });
    expect(exactCutIn).toBe(22);
    expect(cutLengthIn).toBe(22);
  });

  it('rounds up to the next 1/8 in (common practice: cut long, never short), and not on float noise', () => {
    expect(roundCutUp(19.1416, 0.125)).toBe(19.25);
    expect(roundCutUp(19.125, 0.125)).toBe(19.125);
    expect(roundCutUp(0.1 + 0.2, 0.1)).toBeCloseTo(0.3, 12); // 0.30000000000000004 is not a new step
  });

  it('the rounded cut lies within the RMA IP-2 Table 4-8 band of the exact value and is never short (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 400, noNaN: true }), (exact) => {
        const cut = roundCutUp(exact, defaultShopRules.cutRoundingIn);
        expect(cut).toBeGreaterThanOrEqual(exact - 1e-9);
        expect(cut - exact).toBeLessThanOrEqual(cutLengthTolerance(exact) + 1e-9);
      }),
    );
  });

  it('tolerance bands of RMA IP-2 Table 4-8', () => {
    expect(cutLengthTolerance(6)).toBe(1 / 8);
    expect(cutLengthTolerance(12)).toBe(1 / 8);
    expect(cutLengthTolerance(12.01)).toBe(3 / 16);
    expect(cutLengthTolerance(30)).toBe(1 / 4);
    expect(cutLengthTolerance(40)).toBe(3 / 8);
    expect(cutLengthTolerance(72)).toBe(1 / 2);
    expect(cutLengthTolerance(100)).toBeCloseTo(1, 12); // over 72 in: ±1 %
  });
});

describe('slack on every line', () => {
  it('4 % of the length matches the −4 % a hose may shorten under pressure (FAA AC 43.13-1B, ch. 9)', () => {
    expect(defaultShopRules.slackPercent).toBe(4);
    const length = 60;
    const across = requiredSlack(length, defaultShopRules, true);
    expect(across.requiredIn).toBeCloseTo(length * 0.04, 12); // 2.4 in > the 1-1/2 in minimum
    expect(across.rule).toBe('percent');
    // The same 4 % on one mount: the pressure shortening does not care where the ports ride.
    expect(requiredSlack(length, defaultShopRules, false)).toEqual(across);
  });

  it('the mount case’s minimum governs short lines (1-1/2 in across mounts, 1/2 in on one mount — common practice)', () => {
    expect(requiredSlack(20, defaultShopRules, true)).toEqual({ requiredIn: 1.5, rule: 'cross-mount-minimum' });
    expect(requiredSlack(10, defaultShopRules, false)).toEqual({ requiredIn: 0.5, rule: 'same-mount-minimum' });
    // Where the two terms meet: 37.5 in × 4 % = 1.5 in; 12.5 in × 4 % = 0.5 in (the minimum is named on a tie).
    expect(requiredSlack(37.5, defaultShopRules, true).requiredIn).toBeCloseTo(1.5, 12);
    expect(requiredSlack(12.5, defaultShopRules, false).rule).toBe('same-mount-minimum');
    // Past it the percentage wins on one mount: 30 in × 4 % = 1.2 in > 1/2 in.
    expect(requiredSlack(30, defaultShopRules, false)).toEqual({ requiredIn: 1.2, rule: 'percent' });
  });
});

describe('supports', () => {
  it('ports count as supports: spans run port → supports → port', () => {
    expect(unsupportedSpans(40, [30, 10]).map((s) => s.lengthIn)).toEqual([10, 20, 10]);
    expect(unsupportedSpans(40, []).map((s) => s.lengthIn)).toEqual([40]);
  });

  it('proposes the fewest evenly spaced supports within the spacing (18 in, common practice)', () => {
    expect(proposeSupports(40, 18)).toEqual([40 / 3, 80 / 3]);
    expect(proposeSupports(36, 18)).toEqual([18]);
    // Product bound: never more proposals than a line can hold, however long the line.
    expect(proposeSupports(5e8, 18)).toHaveLength(SKETCH_LIMITS.supportsPerLine);
    expect(proposeSupports(12, 18)).toEqual([]);
    fc.assert(
      fc.property(fc.double({ min: 1, max: 400, noNaN: true }), fc.double({ min: 2, max: 40, noNaN: true }), (length, spacing) => {
        const spans = unsupportedSpans(length, proposeSupports(length, spacing));
        expect(Math.max(...spans.map((s) => s.lengthIn))).toBeLessThanOrEqual(spacing + 1e-9);
        expect(spans.length).toBe(Math.max(1, Math.ceil(length / spacing - 1e-9)));
      }),
    );
  });
});
