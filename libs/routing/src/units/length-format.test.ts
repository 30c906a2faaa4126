import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  barToPsi,
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  formatCutLength,
  formatInches,
  formatLength,
  inToMm,
  mmToIn,
  parseInches,
  psiToBar,
} from './length-format.js';

describe('formatInches', () => {
  it.each([
    [23.6875, '23-11/16'],
    [0.5, '1/2'],
    [12, '12'],
    [0, '0'],
    [-0.375, '-3/8'],
    [-23.6875, '-23-11/16'],
    [0.03, '0'], // under half a sixteenth
    [0.032, '1/16'],
    [11.99, '12'], // rounds up into the next whole inch
    [2.25, '2-1/4'], // 4/16 reduces to 1/4
  ])('%d → %s', (value, text) => {
    expect(formatInches(value)).toBe(text);
  });

  it('rounds to the chosen denominator', () => {
    expect(formatInches(23.6875, 8)).toBe('23-3/4');
    expect(formatInches(1.3, 4)).toBe('1-1/4');
  });

  it('refuses a bad denominator or a non-number', () => {
    expect(() => formatInches(1, 0)).toThrow(RangeError);
    expect(() => formatInches(Number.NaN)).toThrow(RangeError);
  });
});

describe('parseInches', () => {
  it.each([
    ['23 11/16', 23.6875],
    ['23-11/16"', 23.6875],
    ['23.6875', 23.6875],
    ['5/8', 0.625],
    ['12"', 12],
    ['12 in', 12],
    ['1 1/2 inches', 1.5],
    ['-3/8', -0.375],
    ['.5', 0.5],
  ])('%s → %d', (text, value) => {
    expect(parseInches(text)).toBe(value);
  });

  it.each(['', 'abc', '1/0', '23 17/16', '1..2', '5/', '-', '12 ft'])('rejects %j with a RangeError naming it', (text) => {
    expect(() => parseInches(text)).toThrow(RangeError);
    expect(() => parseInches(text)).toThrow(text === '' ? /is not a length/ : text);
  });

  it('round-trips every sixteenth: parse(format(x)) = x', () => {
    fc.assert(
      fc.property(fc.integer({ min: -10_000, max: 10_000 }), (sixteenths) => {
        const value = sixteenths / 16;
        expect(parseInches(formatInches(value))).toBe(value);
      }),
    );
  });

  it('format(parse(x)) is within half a sixteenth of any decimal', () => {
    fc.assert(
      fc.property(fc.double({ min: -500, max: 500, noNaN: true }), (value) => {
        expect(Math.abs(parseInches(formatInches(value)) - value)).toBeLessThanOrEqual(1 / 32 + 1e-12);
      }),
    );
  });
});

describe('unit conversions', () => {
  it('uses the international inch, exactly 25.4 mm (1959 agreement; NIST SP 811 Appendix B)', () => {
    expect(inToMm(1)).toBe(25.4);
    expect(inToMm(100)).toBe(2540);
    expect(mmToIn(25.4)).toBe(1);
    expect(formatLength(23.6875, 'mm')).toBe('602 mm'); // 601.66 mm
    expect(formatLength(23.6875, 'in')).toBe('23-11/16"');
  });

  it('converts psi to bar by NIST SP 811 Appendix B.8 (1 psi = 6.894 757 E+03 Pa)', () => {
    expect(psiToBar(1)).toBeCloseTo(0.06894757, 8);
    expect(psiToBar(250)).toBeCloseTo(17.2369, 4); // SAE J1532 Type A: 250 psi ≈ 1.7 MPa
    expect(barToPsi(psiToBar(150))).toBeCloseTo(150, 10);
  });

  it('converts °F and °C by NIST SP 811 Appendix B.8 (t/°C = (t/°F − 32)/1.8), checked at the fixed points of water', () => {
    expect(fahrenheitToCelsius(212)).toBe(100);
    expect(fahrenheitToCelsius(32)).toBe(0);
    expect(fahrenheitToCelsius(-40)).toBe(-40);
    expect(celsiusToFahrenheit(150)).toBe(302); // SAE J1532 class 150 °C
  });
});

describe('formatCutLength (common practice: cut long, never short; 1 in = 25.4 mm exactly, NIST SP 811 App. B)', () => {
  it.each([
    [23.625, 'in', '23-5/8"'],
    [23.6251, 'in', '23-11/16"'], // a hair over 5/8 rounds up, where formatInches would round down
    [23.6875, 'in', '23-11/16"'],
    [23.625, 'mm', '601 mm'], // 600.075 mm; formatLength shows 600 mm, 0.075 mm short
    [10, 'mm', '254 mm'], // exactly 254 mm: no step up from float noise
    [0.5, 'mm', '13 mm'], // 12.7 mm
  ] as const)('%d in as %s → %s', (value, unit, text) => {
    expect(formatCutLength(value, unit)).toBe(text);
  });

  it('is never shorter than the length it shows', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 2000, noNaN: true }), (value) => {
        expect(Number.parseInt(formatCutLength(value, 'mm'), 10)).toBeGreaterThanOrEqual(inToMm(value) - 1e-6);
        expect(parseInches(formatCutLength(value, 'in'))).toBeGreaterThanOrEqual(value - 1e-6);
      }),
    );
  });
});
