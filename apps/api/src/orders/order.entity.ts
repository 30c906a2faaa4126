import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import { numericColumn } from '../database/column-transformers.js';
import type { OrderStatus } from './order-status.js';

/** One supplier's order sheet, drafted from approved circuits (checks and indexes in the migration); lines in `order_lines`. */
@Entity({ name: 'orders' })
export class OrderEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_orders' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  /** Null for the sheet of parts that have no supplier yet. */
  @Column({ name: 'supplier_id', type: 'uuid', nullable: true })
  supplierId: string | null;

  @Column({ type: 'text', default: 'draft' })
  status: OrderStatus;

  @Column({ name: 'circuit_ids', type: 'uuid', array: true, default: () => "'{}'" })
  circuitIds: string[];

  /** The shop's rate when the order was drafted, so later rate changes do not alter it. */
  @Column({ name: 'tax_rate_percent', type: 'numeric', precision: 6, scale: 3, default: 0, transformer: numericColumn })
  taxRatePercent: number;

  @Column({ name: 'subtotal_cents', type: 'integer', default: 0 })
  subtotalCents: number;

  @Column({ name: 'tax_cents', type: 'integer', default: 0 })
  taxCents: number;

  @Column({ name: 'total_cents', type: 'integer', default: 0 })
  totalCents: number;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true })
  sentAt: Date | null;

  @VersionColumn()
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
