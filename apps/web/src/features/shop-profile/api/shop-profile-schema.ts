import { z } from 'zod';

/** `GET /api/shop` and the answer of `PATCH`: the caller's shop and its row version. */
export const shopProfileSchema = z.object({
  id: z.string().min(1),
  name: z.string(),
  slug: z.string(),
  timezone: z.string().min(1),
  taxRatePercent: z.number().finite().nonnegative(),
  version: z.number().int().positive(),
  updatedAt: z.iso.datetime({ offset: true }),
});

export type ShopProfile = z.infer<typeof shopProfileSchema>;

/**
 * Body of `PATCH /api/shop`: the row version the change was made against and only the fields the
 * admin changed, so a re-applied save after a conflict keeps what someone else changed meanwhile.
 */
export type SaveShopProfileInput = { version: number } & Partial<Pick<ShopProfile, 'name' | 'timezone' | 'taxRatePercent'>>;
