import { describe, expect, it } from 'vitest';
import { basicPitchDiameterIn, parseFractionIn, parseUnifiedDesignation } from './unified-thread.js';

describe('basic pitch diameter, ASME B1.1 (published basic pitch diameters)', () => {
  // Expected values: ASME B1.1 basic pitch diameters as given in DOMAIN.md §1.
  const published: Array<[string, number]> = [
    ['7/16-20 UNF', 0.405],
    ['1/2-20 UNF', 0.4675],
    ['9/16-18 UNF', 0.5264],
    ['5/8-18 UNF', 0.5889],
    ['3/4-16 UNF', 0.7094],
    ['7/8-14 UNF', 0.8286],
  ];
  it.each(published)('%s → E = %f in (ASME B1.1)', (designation, expected) => {
    const thread = parseUnifiedDesignation(designation);
    expect(thread).toBeDefined();
    expect(basicPitchDiameterIn(thread!.majorDiameterIn, thread!.tpi)).toBeCloseTo(expected, 4);
  });

  it('rejects non-positive inputs', () => {
    expect(() => basicPitchDiameterIn(0, 18)).toThrow(RangeError);
    expect(() => basicPitchDiameterIn(0.5625, -1)).toThrow(RangeError);
  });
});

describe('unified designations', () => {
  it('reads fractional and mixed sizes', () => {
    expect(parseUnifiedDesignation('9/16-18 UNF')).toEqual({ designation: '9/16-18 UNF', majorDiameterIn: 0.5625, tpi: 18, series: 'UNF' });
    expect(parseUnifiedDesignation('1-1/16-12 UN')).toEqual({ designation: '1-1/16-12 UN', majorDiameterIn: 1.0625, tpi: 12, series: 'UN' });
    expect(parseUnifiedDesignation('2-1/2-12 un')).toMatchObject({ majorDiameterIn: 2.5, tpi: 12, series: 'UN' });
    expect(parseUnifiedDesignation('7/16-28 UNEF')).toMatchObject({ majorDiameterIn: 0.4375, tpi: 28, series: 'UNEF' });
  });

  it('refuses what is not a unified designation', () => {
    for (const text of ['M14x1.5', '1/4-18 NPT', '9/16', '9/16-18', '0/16-18 UNF', '']) {
      expect(parseUnifiedDesignation(text), text).toBeUndefined();
    }
  });

  it('parses shop fractions', () => {
    expect(parseFractionIn('1-5/16')).toBeCloseTo(1.3125, 10);
    expect(parseFractionIn('1 5/16')).toBeCloseTo(1.3125, 10);
    expect(parseFractionIn('2')).toBe(2);
    expect(parseFractionIn('3/0')).toBeUndefined();
    expect(parseFractionIn('abc')).toBeUndefined();
  });
});
