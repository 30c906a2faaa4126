import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { In, type DataSource, type EntityManager } from 'typeorm';
import { UserEntity } from '../users/user.entity.js';
import { NotificationEntity } from './notification.entity.js';

export interface NotificationEvent {
  shopId: string;
  recipientUserIds: string[];
  subject: string;
  body: string;
}

/**
 * Records one notification per recipient (active users of the same shop only); delivery is the
 * mail side's job. Pass `manager` to write in the caller's transaction, so a rolled-back change
 * tells no one.
 */
@Injectable()
export class NotificationsService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async notify(event: NotificationEvent, manager: EntityManager = this.dataSource.manager): Promise<number> {
    const wanted = [...new Set(event.recipientUserIds)];
    if (!wanted.length) return 0;
    const recipients = await manager.getRepository(UserEntity).find({
      select: { id: true },
      where: { id: In(wanted), shopId: event.shopId, active: true },
    });
    if (!recipients.length) return 0;
    await manager.getRepository(NotificationEntity).insert(
      recipients.map((user) => ({ shopId: event.shopId, recipientId: user.id, subject: event.subject, body: event.body, sentAt: null })),
    );
    return recipients.length;
  }
}
