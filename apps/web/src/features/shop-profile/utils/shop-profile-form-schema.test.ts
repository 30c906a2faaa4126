import { describe, expect, it } from 'vitest';
import { shopProfileFormSchema } from './shop-profile-form-schema';

// Limits: the shop profile brief (name required, tax rate 0–30 % with two decimals; rates above
// 30 % are not in use for sales tax: common practice). Zone names: IANA time zone database.
const valid = { name: 'Tidewater Rod & Diesel', timezone: 'America/Denver', taxRatePercent: '8.25' };

function messageFor(values: Partial<typeof valid>, field: keyof typeof valid): string | undefined {
  const result = shopProfileFormSchema.safeParse({ ...valid, ...values });
  return result.success ? undefined : result.error.issues.find((issue) => issue.path[0] === field)?.message;
}

describe('shopProfileFormSchema', () => {
  it('reads a trimmed name, an IANA zone and a percentage as a number', () => {
    expect(shopProfileFormSchema.parse({ ...valid, name: '  Tidewater  ', taxRatePercent: ' 7,5 % ' })).toEqual({
      name: 'Tidewater',
      timezone: 'America/Denver',
      taxRatePercent: 7.5,
    });
  });

  it('accepts the ends of the tax range: 0 and 30', () => {
    expect(shopProfileFormSchema.parse({ ...valid, taxRatePercent: '0' }).taxRatePercent).toBe(0);
    expect(shopProfileFormSchema.parse({ ...valid, taxRatePercent: '30.00' }).taxRatePercent).toBe(30);
  });

  it('rejects rates outside 0–30 and more than two decimals', () => {
    expect(messageFor({ taxRatePercent: '30.01' }, 'taxRatePercent')).toBe('Enter a rate from 0 to 30 %.');
    expect(messageFor({ taxRatePercent: '-1' }, 'taxRatePercent')).toBe('Enter a rate from 0 to 30 %.');
    expect(messageFor({ taxRatePercent: '8.125' }, 'taxRatePercent')).toBe(
      'Enter the rate as a number with at most two decimals, for example 8.25.',
    );
    expect(messageFor({ taxRatePercent: 'eight' }, 'taxRatePercent')).toMatch(/at most two decimals/);
    expect(messageFor({ taxRatePercent: ' ' }, 'taxRatePercent')).toBe('Enter the sales tax rate; 0 when no tax applies.');
  });

  it('requires a name and a zone the IANA database knows', () => {
    expect(messageFor({ name: '   ' }, 'name')).toBe('Enter the shop name.');
    expect(messageFor({ timezone: 'Mars/Olympus_Mons' }, 'timezone')).toBe('Choose a time zone from the list.');
  });
});
