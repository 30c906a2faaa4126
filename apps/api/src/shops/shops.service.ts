import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { ConflictError, NotFoundError } from '../common/errors/app-error.js';
import type { ShopProfileChanges } from './dto/shop-profile.schemas.js';
import { toShopProfileDto } from './shop-profile.mapper.js';
import { ShopEntity } from './shop.entity.js';

@Injectable()
export class ShopsService {
  constructor(@InjectRepository(ShopEntity) private readonly shops: Repository<ShopEntity>) {}

  /** The caller's own shop; callers pass the shopId from their token, never from the request. */
  async getOwnShop(shopId: string): Promise<ShopEntity> {
    const shop = await this.shops.findOneBy({ id: shopId });
    if (!shop) throw new NotFoundError('The shop');
    return shop;
  }

  /** Edits name, time zone or tax rate against `version`; a stale version answers 409 with the current profile. */
  async updateProfile(shopId: string, changes: ShopProfileChanges): Promise<ShopEntity> {
    const current = await this.getOwnShop(shopId);
    const { version, ...fields } = changes;
    if (current.version !== version) throw this.staleVersion(current);
    const updates = Object.fromEntries(Object.entries(fields).filter(([, value]) => value !== undefined));
    if (Object.keys(updates).length === 0) return current;
    const result = await this.shops.update({ id: shopId, version }, updates);
    if (!result.affected) throw this.staleVersion(await this.getOwnShop(shopId));
    return this.getOwnShop(shopId);
  }

  private staleVersion(current: ShopEntity): ConflictError {
    return new ConflictError('The shop profile was changed by someone else. Review the current values and try again.', {
      current: toShopProfileDto(current),
    });
  }
}
