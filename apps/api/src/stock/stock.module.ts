import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { PartEntity } from '../parts/part.entity.js';
import { PartsModule } from '../parts/parts.module.js';
import { UserEntity } from '../users/user.entity.js';
import { StockAdjustmentEntity } from './stock-adjustment.entity.js';
import { StockController } from './stock.controller.js';
import { StockService } from './stock.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([StockAdjustmentEntity, PartEntity, UserEntity]), PartsModule],
  controllers: [StockController],
  providers: [StockService],
  exports: [StockService],
})
export class StockModule {}
