import { Module } from '@nestjs/common';
import { PartsModule } from '../parts/parts.module.js';
import { ReferenceController } from './reference.controller.js';
import { ReferenceService } from './reference.service.js';

@Module({
  imports: [PartsModule],
  controllers: [ReferenceController],
  providers: [ReferenceService],
})
export class ReferenceModule {}
