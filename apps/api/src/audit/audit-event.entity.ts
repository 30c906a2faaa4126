import { Check, Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import { ShopEntity } from '../shops/shop.entity.js';
import { UserEntity } from '../users/user.entity.js';
import type { AuditAction } from './audit-action.js';

/** One step in a circuit's history: who did what, on which revision. Written, never changed. */
@Entity({ name: 'audit_events' })
@Index('idx_audit_events_circuit_seq', ['circuitId', 'seq'])
@Check('ck_audit_events_action', `"action" IN ('submit','acknowledge','approve','return','order','install')`)
export class AuditEventEntity {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'pk_audit_events' })
  id: string;

  /** Insertion order (an identity column), so events of one transaction keep their order. */
  @Column({ type: 'bigint', insert: false, update: false })
  seq: string;

  @Column({ name: 'shop_id', type: 'uuid' })
  shopId: string;

  @ManyToOne(() => ShopEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'shop_id', foreignKeyConstraintName: 'fk_audit_events_shop' })
  shop?: ShopEntity;

  @Column({ name: 'circuit_id', type: 'uuid' })
  circuitId: string;

  @ManyToOne(() => CircuitEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'circuit_id', foreignKeyConstraintName: 'fk_audit_events_circuit' })
  circuit?: CircuitEntity;

  @Column({ name: 'actor_id', type: 'uuid', nullable: true })
  actorId: string | null;

  @ManyToOne(() => UserEntity, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'actor_id', foreignKeyConstraintName: 'fk_audit_events_actor' })
  actor?: UserEntity | null;

  @Column({ type: 'text' })
  action: AuditAction;

  @Column({ name: 'revision_number', type: 'integer', nullable: true })
  revisionNumber: number | null;

  @Column({ type: 'jsonb', default: () => "'{}'" })
  details: Record<string, unknown>;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
