/**
 * Every unit fact of Linesmith lives here: fractional inches, millimetres, psi/bar, °F/°C.
 * Stored values are plain numbers with the unit in the field name (lengthIn, pressurePsi).
 */

import { MM_PER_IN } from '@linesmith/catalog';

/** The international inch, kept once in the catalogue library (the lower one) and re-exported here. */
export { MM_PER_IN };

/** 1 psi = 1 lbf/in² = 4.4482216152605 N / (0.0254 m)² = 6894.757293168361 Pa (NIST SP 811 B.8). */
export const PA_PER_PSI = 4.4482216152605 / (0.0254 * 0.0254);
export const PA_PER_BAR = 100_000;

export type LengthUnit = 'in' | 'mm';
export type PressureUnit = 'psi' | 'bar';
export type TemperatureUnit = 'F' | 'C';

export const inToMm = (valueIn: number): number => valueIn * MM_PER_IN;
export const mmToIn = (valueMm: number): number => valueMm / MM_PER_IN;
export const psiToBar = (psi: number): number => (psi * PA_PER_PSI) / PA_PER_BAR;
export const barToPsi = (bar: number): number => (bar * PA_PER_BAR) / PA_PER_PSI;
export const fahrenheitToCelsius = (f: number): number => ((f - 32) * 5) / 9;
export const celsiusToFahrenheit = (c: number): number => (c * 9) / 5 + 32;

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

/**
 * Fractional inches as a shop writes them: "23-11/16", "1/2", "12", "-3/8".
 * Rounds to the nearest 1/denominator and reduces the fraction.
 */
export function formatInches(valueIn: number, denominator = 16): string {
  if (!Number.isFinite(valueIn)) throw new RangeError(`Cannot format ${valueIn} as inches`);
  if (!Number.isInteger(denominator) || denominator < 1) {
    throw new RangeError(`Denominator must be a positive whole number, got ${denominator}`);
  }
  const steps = Math.round(Math.abs(valueIn) * denominator);
  if (steps === 0) return '0';
  const sign = valueIn < 0 ? '-' : '';
  const whole = Math.floor(steps / denominator);
  const rest = steps % denominator;
  if (rest === 0) return `${sign}${whole}`;
  const divisor = gcd(rest, denominator);
  const fraction = `${rest / divisor}/${denominator / divisor}`;
  return whole === 0 ? `${sign}${fraction}` : `${sign}${whole}-${fraction}`;
}

const UNIT_SUFFIX = /\s*(?:"|''|in\.?|inch|inches)$/i;
const MIXED = /^(\d+)(?:\s*-\s*|\s+)(\d+)\s*\/\s*(\d+)$/;
const FRACTION = /^(\d+)\s*\/\s*(\d+)$/;
const DECIMAL = /^(?:\d+(?:\.\d*)?|\.\d+)$/;

/**
 * Reads a length in inches: `23 11/16`, `23-11/16"`, `23.6875`, `5/8`, `12"`, `12 in`.
 * Throws a RangeError naming the text when it is not a length.
 */
export function parseInches(text: string): number {
  const garbage = () => new RangeError(`"${text}" is not a length in inches (try 23-11/16, 23 11/16 or 23.6875)`);
  let body = text.trim().replace(UNIT_SUFFIX, '').trim();
  let sign = 1;
  if (body.startsWith('-')) {
    sign = -1;
    body = body.slice(1).trim();
  } else if (body.startsWith('+')) {
    body = body.slice(1).trim();
  }
  if (body === '') throw garbage();
  const mixed = MIXED.exec(body);
  if (mixed) {
    const [whole, num, den] = [Number(mixed[1]), Number(mixed[2]), Number(mixed[3])];
    if (den === 0 || num >= den) throw garbage();
    return sign * (whole + num / den);
  }
  const fraction = FRACTION.exec(body);
  if (fraction) {
    const [num, den] = [Number(fraction[1]), Number(fraction[2])];
    if (den === 0) throw garbage();
    return sign * (num / den);
  }
  if (DECIMAL.test(body)) return sign * Number(body);
  throw garbage();
}

/** A length for display: fractional inches to 1/16 with the inch mark, or whole millimetres. */
export function formatLength(valueIn: number, unit: LengthUnit): string {
  if (unit === 'mm') return `${Math.round(inToMm(valueIn))} mm`;
  return `${formatInches(valueIn)}"`;
}

/** Float noise allowed below a step before rounding up: 23.6875 stored as 23.68750000001 stays 23-11/16. */
const ROUND_UP_NOISE = 1e-9;

/**
 * A cut length for display, rounded UP (cut long, never short — common practice): to the next
 * 1/16 in as a fraction with the inch mark, or to the next whole millimetre.
 */
export function formatCutLength(valueIn: number, unit: LengthUnit): string {
  if (!Number.isFinite(valueIn)) throw new RangeError(`Cannot format ${valueIn} as a cut length`);
  if (unit === 'mm') return `${Math.ceil(inToMm(valueIn) - ROUND_UP_NOISE)} mm`;
  return `${formatInches(Math.ceil(valueIn * 16 - ROUND_UP_NOISE) / 16)}"`;
}

export function formatPressure(psi: number, unit: PressureUnit): string {
  return unit === 'bar' ? `${psiToBar(psi).toFixed(1)} bar` : `${Math.round(psi)} psi`;
}

export function formatTemperature(fahrenheit: number, unit: TemperatureUnit): string {
  return unit === 'C' ? `${Math.round(fahrenheitToCelsius(fahrenheit))} °C` : `${Math.round(fahrenheit)} °F`;
}
