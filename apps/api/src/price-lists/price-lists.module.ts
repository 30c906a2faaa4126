import { Module } from '@nestjs/common';
import { PartsModule } from '../parts/parts.module.js';
import { SuppliersModule } from '../suppliers/suppliers.module.js';
import { PriceListsController } from './price-lists.controller.js';
import { PriceListsService } from './price-lists.service.js';

@Module({
  imports: [PartsModule, SuppliersModule],
  controllers: [PriceListsController],
  providers: [PriceListsService],
})
export class PriceListsModule {}
