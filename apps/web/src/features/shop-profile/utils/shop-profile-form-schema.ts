import { z } from 'zod';
import type { SaveShopProfileInput, ShopProfile } from '../api/shop-profile-schema';

export type ShopProfileFieldId = 'name' | 'timezone' | 'taxRatePercent';
export type ShopProfileFormValues = Record<ShopProfileFieldId, string>;

/** Sales tax rates in use stay well under this; a larger figure is a typing slip (common practice). */
export const maxTaxRatePercent = 30;

/** The IANA zones this browser knows, for the time zone select. */
export function timeZoneChoices(): readonly string[] {
  return Intl.supportedValuesOf('timeZone');
}

function isTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

/** A plain decimal with at most two places: 8, 8.5, 8.25 (a comma is read as the decimal point). */
const percentText = /^-?(?:\d+(?:\.\d{0,2})?|\.\d{1,2})$/;

/** Form text → the fields of `PATCH /api/shop` (the version is added by the form). */
export const shopProfileFormSchema = z.object({
  name: z.string().trim().min(1, 'Enter the shop name.').max(120, 'Keep the shop name to 120 characters.'),
  timezone: z.string().refine(isTimeZone, 'Choose a time zone from the list.'),
  taxRatePercent: z
    .string()
    .trim()
    .min(1, 'Enter the sales tax rate; 0 when no tax applies.')
    .transform((text) => text.replace(/\s*%$/, '').replace(',', '.'))
    .refine((text) => percentText.test(text), 'Enter the rate as a number with at most two decimals, for example 8.25.')
    .transform(Number)
    .refine((rate) => rate >= 0 && rate <= maxTaxRatePercent, `Enter a rate from 0 to ${maxTaxRatePercent} %.`),
}) satisfies z.ZodType<Required<Omit<SaveShopProfileInput, 'version'>>, ShopProfileFormValues>;

/** The form's texts for a profile. */
export function shopProfileFormValues(profile: ShopProfile): ShopProfileFormValues {
  return { name: profile.name, timezone: profile.timezone, taxRatePercent: String(profile.taxRatePercent) };
}
