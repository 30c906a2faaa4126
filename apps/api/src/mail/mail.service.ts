import { Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import nodemailer, { type Transporter } from 'nodemailer';
import type { Repository } from 'typeorm';
import { AppError } from '../common/errors/app-error.js';
import { ErrorCode } from '../common/errors/error-code.js';
import { AppConfigService } from '../config/app-config.service.js';
import type { MailMessage } from './mail-message.js';
import { OutboxEntity } from './outbox.entity.js';

export interface OutboxDto {
  id: string;
  to: string;
  subject: string;
  status: OutboxEntity['status'];
  error: string | null;
  messageId: string | null;
  attachmentNames: string[];
  createdAt: string;
}

export function toOutboxDto(row: OutboxEntity): OutboxDto {
  return {
    id: row.id,
    to: row.to,
    subject: row.subject,
    status: row.status,
    error: row.error,
    messageId: row.messageId,
    attachmentNames: row.attachmentNames,
    createdAt: row.createdAt.toISOString(),
  };
}

/** The mail server refused or could not be reached; the attempt is in the outbox. */
export class MailDeliveryError extends AppError {
  constructor() {
    super(ErrorCode.Unavailable, 'The e-mail could not be sent. Check the mail settings and try again.');
  }
}

/** Sends e-mail over SMTP and records every attempt in the outbox. */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly logger = new Logger('Mail');
  private readonly transport: Transporter;

  constructor(
    private readonly config: AppConfigService,
    @InjectRepository(OutboxEntity) private readonly outbox: Repository<OutboxEntity>,
  ) {
    const user = config.get('SMTP_USER');
    const pass = config.get('SMTP_PASS');
    this.transport = nodemailer.createTransport({
      host: config.get('SMTP_HOST'),
      port: config.get('SMTP_PORT'),
      secure: config.get('SMTP_PORT') === 465,
      auth: user && pass ? { user, pass } : undefined,
      connectionTimeout: 10_000,
    });
  }

  /** Sends one message; a failure is recorded and then thrown as MailDeliveryError (503). */
  async send(message: MailMessage): Promise<OutboxDto> {
    const attachments = message.attachments ?? [];
    const record = this.outbox.create({
      shopId: message.shopId ?? null,
      to: message.to,
      subject: message.subject,
      attachmentNames: attachments.map((attachment) => attachment.filename),
      error: null,
      messageId: null,
    });
    try {
      const info = await this.transport.sendMail({
        from: this.config.get('SMTP_FROM'),
        to: message.to,
        subject: message.subject,
        text: message.text,
        html: message.html,
        attachments,
      });
      record.status = 'sent';
      record.messageId = info.messageId ?? null;
      return toOutboxDto(await this.outbox.save(record));
    } catch (error) {
      record.status = 'failed';
      record.error = error instanceof Error ? error.message : String(error);
      await this.outbox.save(record);
      this.logger.warn(`mail to ${message.to} failed: ${record.error}`);
      throw new MailDeliveryError();
    }
  }

  async listOutbox(shopId: string, limit = 100): Promise<OutboxDto[]> {
    const rows = await this.outbox.find({ where: { shopId }, order: { createdAt: 'DESC' }, take: limit });
    return rows.map(toOutboxDto);
  }

  onModuleDestroy(): void {
    this.transport.close();
  }
}
