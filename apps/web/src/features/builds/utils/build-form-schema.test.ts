import { describe, expect, it } from 'vitest';
import { buildFormSchema, emptyBuildForm, type BuildFormInput } from './build-form-schema';

// Expected rules: the builds brief (year 1900 to next year, e-mail format, required vehicle make
// and model and customer name). "Now" is fixed so next year is known: 2026 → latest 2027.
const now = new Date('2026-03-01T12:00:00Z');
const schema = buildFormSchema(now);
const valid: BuildFormInput = { ...emptyBuildForm, make: 'Harlan', model: 'Half-ton pickup', customerName: 'Corliss Ambry' };

function errorsOf(input: BuildFormInput): Record<string, string> {
  const result = schema.safeParse(input);
  if (result.success) return {};
  return Object.fromEntries(result.error.issues.map((issue) => [String(issue.path[0]), issue.message]));
}

describe('build form validation', () => {
  it('accepts the required fields alone, with no year and no e-mail', () => {
    const result = schema.parse(valid);
    expect(result.year).toBe('');
    expect(result.customerEmail).toBe('');
  });

  it('requires the vehicle make and model and the customer name', () => {
    expect(Object.keys(errorsOf(emptyBuildForm)).sort()).toEqual(['customerName', 'make', 'model']);
    expect(errorsOf({ ...valid, make: '   ' })).toHaveProperty('make', 'Enter the vehicle make.');
  });

  it.each([
    ['1899', false],
    ['1900', true],
    ['1976', true],
    ['2027', true],
    ['2028', false],
    ['76', false],
    ['19a6', false],
  ])('year %s is accepted: %s', (year, ok) => {
    const errors = errorsOf({ ...valid, year });
    expect('year' in errors).toBe(!ok);
    if (!ok) expect(errors.year).toBe('Enter a year from 1900 to 2027, or leave it empty.');
  });

  it('keeps the year as trimmed text, as the API stores it', () => {
    expect(schema.parse({ ...valid, year: ' 1976 ' }).year).toBe('1976');
  });

  // Address forms after RFC 5321 §4.1.2 (local-part "@" domain); ".example" is reserved by RFC 2606.
  it.each([
    ['corliss@customer.example', true],
    ['c.ambry+shop@mail.customer.example', true],
    ['corliss@', false],
    ['corliss customer.example', false],
    ['@customer.example', false],
  ])('e-mail %s is accepted: %s', (email, ok) => {
    expect('customerEmail' in errorsOf({ ...valid, customerEmail: email })).toBe(!ok);
  });
});
