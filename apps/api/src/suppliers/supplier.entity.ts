import {
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
import { ShopEntity } from '../shops/shop.entity.js';

/** A business the shop buys parts from. Names are unique per shop (expression index, see the migration). */
@Entity({ name: 'suppliers' })
@Index('uq_suppliers_shop_name', { synchronize: false })
@Index('uq_suppliers_shop_demo_key', { synchronize: false })
export class SupplierEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_suppliers' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @ManyToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_suppliers_shop' })
  shop?: ShopEntity;

  @Column({ type: 'text' })
  name: string;

  @Column({ type: 'text', default: '' })
  email: string;

  @Column({ name: 'account_number', type: 'text', default: '' })
  accountNumber: string;

  @Column({ type: 'text', default: '' })
  phone: string;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  /** Set only on seeded demo rows, so the seed can find them again. */
  @Column({ name: 'demo_key', type: 'text', nullable: true })
  demoKey: string | null;

  @VersionColumn()
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
