import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import { AuditController } from './audit.controller.js';
import { AuditEventEntity } from './audit-event.entity.js';
import { AuditService } from './audit.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([AuditEventEntity, CircuitEntity])],
  controllers: [AuditController],
  providers: [AuditService],
  exports: [AuditService],
})
export class AuditModule {}
