import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { versionSchema } from '../../common/validation/numbers.js';

function isTimeZone(zone: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

export const updateShopProfileSchema = z.object({
  version: versionSchema,
  name: z.string().trim().min(1, 'Enter the shop name.').max(120).optional(),
  timezone: z.string().trim().refine(isTimeZone, 'Choose a time zone such as America/Denver.').optional(),
  /** Sales tax on orders, percent (e.g. 8.25); stored to 3 decimals. */
  taxRatePercent: z
    .number()
    .finite()
    .min(0, 'The tax rate cannot be negative.')
    .max(100, 'The tax rate is a percentage up to 100.')
    .transform((value) => Math.round(value * 1000) / 1000)
    .optional(),
});
export class UpdateShopProfileDto extends zodDto(updateShopProfileSchema) {}
export type ShopProfileChanges = z.output<typeof updateShopProfileSchema>;

export interface ShopProfileDto {
  id: string;
  name: string;
  slug: string;
  timezone: string;
  taxRatePercent: number;
  version: number;
  updatedAt: string;
}
