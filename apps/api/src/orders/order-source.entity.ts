import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** No supplier yet: the key of the sheet of parts without one. */
export const NO_SUPPLIER_KEY = 'none';

/**
 * Which circuit revision an order was drafted from. The unique index on (circuit, revision,
 * supplier) — see the migration — makes a second draft of the same revision for the same supplier
 * impossible, also when two requests race.
 */
@Entity({ name: 'order_sources' })
export class OrderSourceEntity {
  @PrimaryColumn({ name: 'order_id', type: 'uuid', primaryKeyConstraintName: 'pk_order_sources' })
  orderId: string;

  @PrimaryColumn({ name: 'circuit_id', type: 'uuid', primaryKeyConstraintName: 'pk_order_sources' })
  circuitId: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @Column({ name: 'revision_number', type: 'integer' })
  revisionNumber: number;

  @Column({ name: 'supplier_key', type: 'text' })
  supplierKey: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
