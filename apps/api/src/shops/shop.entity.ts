import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import { numericColumn } from '../database/column-transformers.js';

/** The tenant: every other record belongs to exactly one shop. */
@Entity({ name: 'shops' })
export class ShopEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_shops' })
  id: string;

  @Column({ type: 'text' })
  name: string;

  @Index('uq_shops_slug', { unique: true })
  @Column({ type: 'text' })
  slug: string;

  /** IANA zone name, used when printing dates on shop sheets and order sheets. */
  @Column({ type: 'text', default: 'UTC' })
  timezone: string;

  @Column({ name: 'tax_rate_percent', type: 'numeric', precision: 6, scale: 3, default: 0, transformer: numericColumn })
  taxRatePercent: number;

  @VersionColumn()
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
