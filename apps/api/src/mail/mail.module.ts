import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { MailService } from './mail.service.js';
import { OutboxController } from './outbox.controller.js';
import { OutboxEntity } from './outbox.entity.js';

@Module({
  imports: [TypeOrmModule.forFeature([OutboxEntity])],
  controllers: [OutboxController],
  providers: [MailService],
  exports: [MailService],
})
export class MailModule {}
