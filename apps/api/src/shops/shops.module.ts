import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { ShopEntity } from './shop.entity.js';
import { ShopsService } from './shops.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([ShopEntity])],
  providers: [ShopsService],
  exports: [ShopsService],
})
export class ShopsModule {}
