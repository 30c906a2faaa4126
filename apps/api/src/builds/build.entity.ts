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
import { ShopEntity } from '../shops/shop.entity.js';
import { UserEntity } from '../users/user.entity.js';
import type { BuildStatus } from './build-status.js';

/** One vehicle job for one customer. Vehicle and customer fields are free text ('' when unknown). */
@Entity({ name: 'builds' })
@Index('idx_builds_shop_updated', ['shopId', 'updatedAt'])
@Check('ck_builds_status', `"status" IN ('open','on-hold','done')`)
export class BuildEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_builds' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @ManyToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_builds_shop' })
  shop?: ShopEntity;

  @Column({ name: 'vehicle_year', type: 'text', default: '' })
  vehicleYear: string;

  @Column({ name: 'vehicle_make', type: 'text', default: '' })
  vehicleMake: string;

  @Column({ name: 'vehicle_model', type: 'text', default: '' })
  vehicleModel: string;

  @Column({ name: 'vehicle_engine', type: 'text', default: '' })
  vehicleEngine: string;

  @Column({ name: 'vehicle_transmission', type: 'text', default: '' })
  vehicleTransmission: string;

  @Column({ name: 'customer_name', type: 'text', default: '' })
  customerName: string;

  @Column({ name: 'customer_phone', type: 'text', default: '' })
  customerPhone: string;

  @Column({ name: 'customer_email', type: 'text', default: '' })
  customerEmail: string;

  @Column({ type: 'text', default: '' })
  notes: string;

  @Column({ type: 'text', default: 'open' })
  status: BuildStatus;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdById: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'created_by', foreignKeyConstraintName: 'fk_builds_created_by' })
  createdBy?: UserEntity | null;

  @VersionColumn()
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
