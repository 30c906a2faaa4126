import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { ShopEntity } from '../shops/shop.entity.js';
import { UserEntity } from '../users/user.entity.js';
import { CircuitEntity } from './circuit.entity.js';

/** A numbered, immutable snapshot of a circuit's draft (a database trigger refuses changes; sign-off locks the rest). */
@Entity({ name: 'circuit_revisions' })
@Index('uq_circuit_revisions_circuit_number', ['circuitId', 'number'], { unique: true })
@Check('ck_circuit_revisions_number', `"number" >= 1`)
export class CircuitRevisionEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_circuit_revisions' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @ManyToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_circuit_revisions_shop' })
  shop?: ShopEntity;

  @Column({ name: 'circuit_id', type: 'uuid' })
  circuitId: string;

  @ManyToOne(() => CircuitEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'circuit_id', foreignKeyConstraintName: 'fk_circuit_revisions_circuit' })
  circuit?: CircuitEntity;

  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'jsonb', select: false })
  document: unknown;

  /** The draft version this revision was taken from. */
  @Column({ name: 'draft_version', type: 'integer' })
  draftVersion: number;

  @Column({ name: 'author_id', type: 'uuid', nullable: true })
  authorId: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'author_id', foreignKeyConstraintName: 'fk_circuit_revisions_author' })
  author?: UserEntity | null;

  @Column({ type: 'text', default: '' })
  message: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  /** Set on sign-off; from then on a database trigger refuses any change to the revision. */
  @Column({ name: 'locked_at', type: 'timestamptz', nullable: true })
  lockedAt: Date | null;

  @Column({ name: 'approved_by', type: 'uuid', nullable: true })
  approvedById: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'approved_by', foreignKeyConstraintName: 'fk_circuit_revisions_approved_by' })
  approvedBy?: UserEntity | null;

  @Column({ name: 'approved_at', type: 'timestamptz', nullable: true })
  approvedAt: Date | null;

  /**
   * The rules check signed off with the revision (written with `locked_at`, then locked): its cut
   * lengths and bill of materials are what the shop builds and orders from. NULL before sign-off.
   */
  @Column({ type: 'jsonb', nullable: true, select: false })
  evaluation: unknown;
}
