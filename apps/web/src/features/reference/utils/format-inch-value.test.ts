import { describe, expect, it } from 'vitest';
import { formatInchValue } from './format-inch-value';
import { formatTableLength } from './format-table-length';

describe('formatInchValue', () => {
  it('writes sizes that are fractions as fractions (SAE J514 -12 thread: 1-1/16 in major diameter)', () => {
    expect(formatInchValue(1.0625)).toBe('1-1/16');
    expect(formatInchValue(0.5625)).toBe('9/16');
    expect(formatInchValue(18)).toBe('18');
  });

  it('writes other values as decimals to 4 places, as the standards print them', () => {
    // ASME B1.20.1 Table 2: 1/8 NPT pipe OD 0.405 in; E0 of 1/4-18 is 0.47739 in.
    expect(formatInchValue(0.405)).toBe('0.405');
    expect(formatInchValue(0.47738888)).toBe('0.4774');
    // ISO 261 M14: 14 mm / 25.4 = 0.55118 in.
    expect(formatInchValue(14 / 25.4)).toBe('0.5512');
  });
});

describe('formatTableLength', () => {
  it('gives millimetres to 0.01 with the international inch (NIST SP 811 B.8: 1 in = 25.4 mm)', () => {
    expect(formatTableLength(0.5625, 'mm')).toBe('14.29');
    expect(formatTableLength(1, 'mm')).toBe('25.40');
    expect(formatTableLength(0.5625, 'in')).toBe('9/16');
  });
});
