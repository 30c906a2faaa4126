import { Module } from '@nestjs/common';
import { CircuitsModule } from '../circuits/circuits.module.js';
import { PartsModule } from '../parts/parts.module.js';
import { RulesModule } from '../rules/rules.module.js';
import { CutListController } from './cut-list.controller.js';
import { CutListService } from './cut-list.service.js';

@Module({
  imports: [CircuitsModule, RulesModule, PartsModule],
  controllers: [CutListController],
  providers: [CutListService],
})
export class SpreadsheetsModule {}
