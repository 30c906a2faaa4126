import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { numericColumn } from '../database/column-transformers.js';

/** One change of a part's stock on hand (a count, a delivery booked in), never edited. */
@Entity({ name: 'stock_adjustments' })
export class StockAdjustmentEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_stock_adjustments' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @Column({ name: 'part_id', type: 'uuid' })
  partId: string;

  @Column({ type: 'numeric', precision: 12, scale: 3, transformer: numericColumn })
  delta: number;

  @Column({ type: 'text' })
  reason: string;

  @Column({ name: 'actor_id', type: 'uuid', nullable: true })
  actorId: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
