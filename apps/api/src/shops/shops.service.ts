import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { NotFoundError } from '../common/errors/app-error.js';
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
}
