import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export type OutboxStatus = 'sent' | 'failed';

/** One e-mail the app tried to send and what came of it (indexes and checks in the migration). */
@Entity({ name: 'outbox' })
export class OutboxEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_outbox' })
  id: string;

  /** Null for mail sent before anyone is signed in (e.g. a password reset of an unknown shop). */
  @Column({ name: 'shop_id', type: 'uuid', nullable: true })
  shopId: string | null;

  @Column({ name: 'to_address', type: 'text' })
  to: string;

  @Column({ type: 'text' })
  subject: string;

  @Column({ type: 'text' })
  status: OutboxStatus;

  @Column({ type: 'text', nullable: true })
  error: string | null;

  @Column({ name: 'message_id', type: 'text', nullable: true })
  messageId: string | null;

  @Column({ name: 'attachment_names', type: 'text', array: true, default: () => "'{}'" })
  attachmentNames: string[];

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
