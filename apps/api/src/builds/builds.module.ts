import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import { BuildEntity } from './build.entity.js';
import { BuildsController } from './builds.controller.js';
import { BuildsService } from './builds.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([BuildEntity, CircuitEntity])],
  controllers: [BuildsController],
  providers: [BuildsService],
  exports: [BuildsService],
})
export class BuildsModule {}
