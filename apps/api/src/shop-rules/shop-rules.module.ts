import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { ShopRulesController } from './shop-rules.controller.js';
import { ShopRulesEntity } from './shop-rules.entity.js';
import { ShopRulesService } from './shop-rules.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([ShopRulesEntity])],
  controllers: [ShopRulesController],
  providers: [ShopRulesService],
  exports: [ShopRulesService],
})
export class ShopRulesModule {}
