import type { CircuitKind } from '@linesmith/routing';
import type { Fluid } from '@linesmith/catalog';
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
import { BuildEntity } from '../builds/build.entity.js';
import { numericColumn } from '../database/column-transformers.js';
import { ShopEntity } from '../shops/shop.entity.js';
import type { CircuitStatus } from './circuit-status.js';

/**
 * One fluid loop on a build. `fluid`, `maxPressurePsi` and `maxTempF` mirror the draft's `circuit`
 * block (the document is the truth for evaluation; the columns serve lists and filters).
 * `version` guards the row's fields; `draftVersion` guards the working draft document.
 */
@Entity({ name: 'circuits' })
@Index('idx_circuits_shop_build', ['shopId', 'buildId'])
@Check(
  'ck_circuits_kind',
  `"kind" IN ('transmission-cooler','engine-oil-cooler','fuel','turbo-oil','power-steering','coolant','other')`,
)
@Check('ck_circuits_status', `"status" IN ('draft','in-review','returned','approved','ordered','installed')`)
export class CircuitEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_circuits' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @ManyToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_circuits_shop' })
  shop?: ShopEntity;

  @Column({ name: 'build_id', type: 'uuid' })
  buildId: string;

  @ManyToOne(() => BuildEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'build_id', foreignKeyConstraintName: 'fk_circuits_build' })
  build?: BuildEntity;

  @Column({ type: 'text' })
  name: string;

  @Column({ type: 'text' })
  kind: CircuitKind;

  @Column({ type: 'text' })
  fluid: Fluid;

  @Column({ name: 'max_pressure_psi', type: 'numeric', transformer: numericColumn })
  maxPressurePsi: number;

  @Column({ name: 'max_temp_f', type: 'numeric', transformer: numericColumn })
  maxTempF: number;

  @Column({ type: 'text', default: 'draft' })
  status: CircuitStatus;

  /** The working circuit document (stored as saved; read through `migrateCircuitDocument`). */
  @Column({ type: 'jsonb', select: false })
  draft: unknown;

  @Column({ name: 'draft_version', type: 'integer', default: 1 })
  draftVersion: number;

  @VersionColumn()
  version: number;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
