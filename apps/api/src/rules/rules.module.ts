import { Module } from '@nestjs/common';
import { PartsModule } from '../parts/parts.module.js';
import { ShopRulesModule } from '../shop-rules/shop-rules.module.js';
import { RulesController } from './rules.controller.js';
import { Engine, EnginePoolService } from './engine/engine-pool.service.js';
import { RulesService } from './rules.service.js';

@Module({
  imports: [PartsModule, ShopRulesModule],
  controllers: [RulesController],
  providers: [RulesService, { provide: Engine, useClass: EnginePoolService }],
  exports: [RulesService],
})
export class RulesModule {}
