import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { EntityManager, Repository } from 'typeorm';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import { NotFoundError } from '../common/errors/app-error.js';
import type { AuditAction } from './audit-action.js';
import { AuditEventEntity } from './audit-event.entity.js';

export interface AuditEventInput {
  shopId: string;
  circuitId: string;
  actorId: string;
  action: AuditAction;
  revisionNumber: number | null;
  details?: Record<string, unknown>;
}

export interface AuditEventDto {
  action: AuditAction;
  /** Null once the acting user's account is gone. */
  actor: { id: string; displayName: string } | null;
  revisionNumber: number | null;
  details: Record<string, unknown>;
  at: string;
}

/** The audit trail of circuits. `record` takes the caller's transaction, so the event lands with the change or not at all. */
@Injectable()
export class AuditService {
  constructor(
    @InjectRepository(AuditEventEntity) private readonly events: Repository<AuditEventEntity>,
    @InjectRepository(CircuitEntity) private readonly circuits: Repository<CircuitEntity>,
  ) {}

  async record(manager: EntityManager, event: AuditEventInput): Promise<void> {
    const events = manager.getRepository(AuditEventEntity);
    await events.save(events.create({ ...event, details: event.details ?? {} }));
  }

  /** Oldest first. */
  async list(shopId: string, circuitId: string): Promise<AuditEventDto[]> {
    if (!(await this.circuits.existsBy({ id: circuitId, shopId }))) throw new NotFoundError('The circuit');
    const rows = await this.events
      .createQueryBuilder('event')
      .leftJoinAndSelect('event.actor', 'actor')
      .where('event.shop_id = :shopId AND event.circuit_id = :circuitId', { shopId, circuitId })
      .orderBy('event.seq', 'ASC')
      .getMany();
    return rows.map((row) => ({
      action: row.action,
      actor: row.actor ? { id: row.actor.id, displayName: row.actor.displayName } : null,
      revisionNumber: row.revisionNumber,
      details: row.details,
      at: row.createdAt.toISOString(),
    }));
  }
}
