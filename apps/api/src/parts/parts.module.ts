import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { SuppliersModule } from '../suppliers/suppliers.module.js';
import { PartEntity } from './part.entity.js';
import { PartsController } from './parts.controller.js';
import { PartsService } from './parts.service.js';
import { ShopCatalogueService } from './shop-catalogue.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([PartEntity]), SuppliersModule],
  controllers: [PartsController],
  providers: [PartsService, ShopCatalogueService],
  exports: [PartsService, ShopCatalogueService],
})
export class PartsModule {}
