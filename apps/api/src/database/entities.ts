import { RefreshTokenEntity } from '../auth/refresh-token.entity.js';
import { PartEntity } from '../parts/part.entity.js';
import { ShopRulesEntity } from '../shop-rules/shop-rules.entity.js';
import { ShopEntity } from '../shops/shop.entity.js';
import { SupplierEntity } from '../suppliers/supplier.entity.js';
import { UserEntity } from '../users/user.entity.js';

/** Every entity, listed explicitly (no globs) so the same list works from TS sources and from dist. */
export const ENTITIES = [ShopEntity, UserEntity, RefreshTokenEntity, SupplierEntity, PartEntity, ShopRulesEntity];
