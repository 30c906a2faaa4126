import { Column, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { numericColumn } from '../database/column-transformers.js';
import { OrderEntity } from './order.entity.js';

/** One part on an order, in the supplier's sale units (feet, each, packs). */
@Entity({ name: 'order_lines' })
export class OrderLineEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_order_lines' })
  id: string;

  @Column({ name: 'order_id', type: 'uuid' })
  orderId: string;

  @ManyToOne(() => OrderEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'order_id', foreignKeyConstraintName: 'fk_order_lines_order' })
  order?: OrderEntity;

  @Column({ type: 'integer' })
  position: number;

  @Column({ name: 'part_id', type: 'uuid', nullable: true })
  partId: string | null;

  @Column({ type: 'text' })
  description: string;

  @Column({ name: 'supplier_part_number', type: 'text', default: '' })
  supplierPartNumber: string;

  /** "foot", "each" or "pack of N". */
  @Column({ name: 'sale_unit', type: 'text' })
  saleUnit: string;

  @Column({ type: 'numeric', precision: 12, scale: 3, transformer: numericColumn })
  quantity: number;

  @Column({ name: 'unit_price_cents', type: 'integer' })
  unitPriceCents: number;

  @Column({ name: 'line_total_cents', type: 'integer' })
  lineTotalCents: number;

  @Column({ name: 'received_quantity', type: 'numeric', precision: 12, scale: 3, default: 0, transformer: numericColumn })
  receivedQuantity: number;
}
