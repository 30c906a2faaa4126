import { Check, Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CircuitRevisionEntity } from '../circuits/circuit-revision.entity.js';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import { ShopEntity } from '../shops/shop.entity.js';
import { UserEntity } from '../users/user.entity.js';
import type { ReviewStatus } from './review-status.js';

/**
 * One submission of one revision for sign-off, and its outcome. The flag counts are those of the
 * server's check at submission, cached for the queue; decisions always re-check the revision.
 */
@Entity({ name: 'circuit_reviews' })
@Index('idx_circuit_reviews_shop_status', ['shopId', 'status', 'submittedAt'])
@Index('idx_circuit_reviews_circuit', ['circuitId', 'submittedAt'])
@Check('ck_circuit_reviews_status', `"status" IN ('in-review','approved','returned')`)
export class ReviewEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_circuit_reviews' })
  id: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @ManyToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_circuit_reviews_shop' })
  shop?: ShopEntity;

  @Column({ name: 'circuit_id', type: 'uuid' })
  circuitId: string;

  @ManyToOne(() => CircuitEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'circuit_id', foreignKeyConstraintName: 'fk_circuit_reviews_circuit' })
  circuit?: CircuitEntity;

  @Column({ name: 'revision_id', type: 'uuid' })
  revisionId: string;

  @ManyToOne(() => CircuitRevisionEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'revision_id', foreignKeyConstraintName: 'fk_circuit_reviews_revision' })
  revision?: CircuitRevisionEntity;

  @Column({ name: 'revision_number', type: 'integer' })
  revisionNumber: number;

  @Column({ type: 'text', default: 'in-review' })
  status: ReviewStatus;

  @Column({ type: 'text', default: '' })
  message: string;

  @Column({ name: 'submitted_by', type: 'uuid', nullable: true })
  submittedById: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'submitted_by', foreignKeyConstraintName: 'fk_circuit_reviews_submitted_by' })
  submittedBy?: UserEntity | null;

  @Column({ name: 'submitted_at', type: 'timestamptz', insert: false, update: false })
  submittedAt: Date;

  @Column({ type: 'integer' })
  blockers: number;

  @Column({ type: 'integer' })
  cautions: number;

  @Column({ name: 'decided_by', type: 'uuid', nullable: true })
  decidedById: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'decided_by', foreignKeyConstraintName: 'fk_circuit_reviews_decided_by' })
  decidedBy?: UserEntity | null;

  @Column({ name: 'decided_at', type: 'timestamptz', nullable: true })
  decidedAt: Date | null;

  /** The approver's note, or the reviewer's comments when returned. */
  @Column({ name: 'decision_note', type: 'text', nullable: true })
  decisionNote: string | null;
}
