import type { PartKind, SaleUnit } from '@linesmith/catalog';
import {
  Check,
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  VersionColumn,
} from 'typeorm';
import { numericColumn } from '../database/column-transformers.js';
import { ShopEntity } from '../shops/shop.entity.js';
import { SupplierEntity } from '../suppliers/supplier.entity.js';

/**
 * A catalogue part of one shop. `attributes` holds the kind-specific fields, validated by the
 * catalogue library's schema on every write (see PartsService). Partial unique indexes live in the migration.
 */
@Entity({ name: 'parts' })
@Index('idx_parts_shop_kind', ['shopId', 'kind'])
@Index('uq_parts_shop_supplier_number', { synchronize: false })
@Index('uq_parts_shop_demo_key', { synchronize: false })
@Check('ck_parts_kind', `"kind" IN ('hose','hose-end','adapter','plug','clamp','sleeve','seal','bulkhead')`)
@Check('ck_parts_price_cents', `"price_cents" >= 0`)
@Check('ck_parts_stock_on_hand', `"stock_on_hand" >= 0`)
export class PartEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_parts' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @ManyToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_parts_shop' })
  shop?: ShopEntity;

  @Index('idx_parts_supplier_id')
  @Column({ name: 'supplier_id', type: 'uuid', nullable: true })
  supplierId: string | null;

  @ManyToOne(() => SupplierEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'supplier_id', foreignKeyConstraintName: 'fk_parts_supplier' })
  supplier?: SupplierEntity | null;

  @Column({ type: 'text' })
  kind: PartKind;

  @Column({ name: 'supplier_part_number', type: 'text', default: '' })
  supplierPartNumber: string;

  @Column({ type: 'text' })
  description: string;

  @Column({ name: 'price_cents', type: 'integer', default: 0 })
  priceCents: number;

  @Column({ name: 'sale_unit', type: 'jsonb', default: () => `'{"type":"each"}'` })
  saleUnit: SaleUnit;

  @Column({ name: 'stock_on_hand', type: 'numeric', precision: 12, scale: 3, default: 0, transformer: numericColumn })
  stockOnHand: number;

  @Column({ type: 'boolean', default: false })
  retired: boolean;

  @Column({ type: 'jsonb' })
  attributes: Record<string, unknown>;

  /** The demo catalogue's id (e.g. `demo-hose-6-rubber`) on seeded rows; null otherwise. */
  @Column({ name: 'demo_key', type: 'text', nullable: true })
  demoKey: string | null;

  @VersionColumn()
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
