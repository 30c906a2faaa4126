import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { BuildsModule } from '../builds/builds.module.js';
import { RulesModule } from '../rules/rules.module.js';
import { UploadEntity } from '../uploads/upload.entity.js';
import { BuildCircuitsController } from './build-circuits.controller.js';
import { CircuitCheckService } from './circuit-check.service.js';
import { CircuitDraftsService } from './circuit-drafts.service.js';
import { CircuitRevisionEntity } from './circuit-revision.entity.js';
import { CircuitRevisionsService } from './circuit-revisions.service.js';
import { CircuitEntity } from './circuit.entity.js';
import { CircuitsController } from './circuits.controller.js';
import { CircuitsService } from './circuits.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([CircuitEntity, CircuitRevisionEntity, UploadEntity]), BuildsModule, RulesModule],
  controllers: [BuildCircuitsController, CircuitsController],
  providers: [CircuitsService, CircuitDraftsService, CircuitRevisionsService, CircuitCheckService],
  exports: [CircuitsService, CircuitDraftsService, CircuitRevisionsService],
})
export class CircuitsModule {}
