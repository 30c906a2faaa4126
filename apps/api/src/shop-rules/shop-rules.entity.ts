import type { ShopRules } from '@linesmith/routing';
import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, OneToOne, PrimaryColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import { ShopEntity } from '../shops/shop.entity.js';
import { UserEntity } from '../users/user.entity.js';

/** The admin's thresholds for the rules engine, one row per shop; no row means the defaults. */
@Entity({ name: 'shop_rules' })
export class ShopRulesEntity {
  @PrimaryColumn({ name: 'shop_id', type: 'uuid', primaryKeyConstraintName: 'pk_shop_rules' })
  shopId: string;

  @OneToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_shop_rules_shop' })
  shop?: ShopEntity;

  /** Validated by the routing library's `shopRulesSchema` on every write and read. */
  @Column({ type: 'jsonb' })
  rules: ShopRules;

  @Column({ name: 'updated_by', type: 'uuid', nullable: true })
  updatedBy: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'updated_by', foreignKeyConstraintName: 'fk_shop_rules_updated_by' })
  updater?: UserEntity | null;

  @VersionColumn()
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
