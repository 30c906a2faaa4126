import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/**
 * One booked delivery of an order. Its idempotency key (unique per order, see the migration) or,
 * without one, the same lines moments apart, makes a repeated submit answer the first booking.
 */
@Entity({ name: 'order_receipts' })
export class OrderReceiptEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_order_receipts' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @Column({ name: 'order_id', type: 'uuid' })
  orderId: string;

  @Column({ name: 'idempotency_key', type: 'text', nullable: true })
  idempotencyKey: string | null;

  @Column({ name: 'lines_hash', type: 'text' })
  linesHash: string;

  @Column({ type: 'jsonb' })
  lines: Array<{ orderLineId: string; quantity: number }>;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
