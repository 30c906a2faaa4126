import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module.js';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import { CircuitsModule } from '../circuits/circuits.module.js';
import { NotificationsModule } from '../notifications/notifications.module.js';
import { RulesModule } from '../rules/rules.module.js';
import { CircuitCompareService } from './circuit-compare.service.js';
import { CircuitReviewController } from './circuit-review.controller.js';
import { ReviewAcknowledgementEntity } from './review-acknowledgement.entity.js';
import { ReviewEntity } from './review.entity.js';
import { ReviewsController } from './reviews.controller.js';
import { ReviewsService } from './reviews.service.js';

@Module({
  imports: [
    TypeOrmModule.forFeature([ReviewEntity, ReviewAcknowledgementEntity, CircuitEntity]),
    CircuitsModule,
    RulesModule,
    AuditModule,
    NotificationsModule,
  ],
  controllers: [ReviewsController, CircuitReviewController],
  providers: [ReviewsService, CircuitCompareService],
  exports: [ReviewsService],
})
export class ReviewsModule {}
