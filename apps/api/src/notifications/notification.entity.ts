import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { ShopEntity } from '../shops/shop.entity.js';
import { UserEntity } from '../users/user.entity.js';

/** A message for one user; `sentAt` stays null until the mail side delivers it. */
@Entity({ name: 'notifications' })
@Index('idx_notifications_recipient', ['recipientId', 'createdAt'])
export class NotificationEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_notifications' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @ManyToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_notifications_shop' })
  shop?: ShopEntity;

  @Column({ name: 'recipient_id', type: 'uuid' })
  recipientId: string;

  @ManyToOne(() => UserEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'recipient_id', foreignKeyConstraintName: 'fk_notifications_recipient' })
  recipient?: UserEntity;

  @Column({ type: 'text' })
  subject: string;

  @Column({ type: 'text' })
  body: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true })
  sentAt: Date | null;
}
