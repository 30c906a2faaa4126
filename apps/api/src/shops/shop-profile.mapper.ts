import type { ShopProfileDto } from './dto/shop-profile.schemas.js';
import type { ShopEntity } from './shop.entity.js';

export function toShopProfileDto(shop: ShopEntity): ShopProfileDto {
  return {
    id: shop.id,
    name: shop.name,
    slug: shop.slug,
    timezone: shop.timezone,
    taxRatePercent: shop.taxRatePercent,
    version: shop.version,
    updatedAt: shop.updatedAt.toISOString(),
  };
}
