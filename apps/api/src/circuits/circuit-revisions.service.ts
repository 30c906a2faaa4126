import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import type { CircuitEvaluation } from '@linesmith/routing';
import type { DataSource, EntityManager, Repository } from 'typeorm';
import { NotFoundError } from '../common/errors/app-error.js';
import { UserEntity } from '../users/user.entity.js';
import { CircuitRevisionEntity } from './circuit-revision.entity.js';
import { CircuitEntity } from './circuit.entity.js';
import { readStoredDocument } from './circuit-document.js';
import { toRevisionDto, toRevisionSummaryDto } from './circuit.mapper.js';
import type { RevisionDto, RevisionSummaryDto } from './dto/circuit.dto.js';

/** Numbered, immutable snapshots of a circuit's draft ("Save version", and submission for review). */
@Injectable()
export class CircuitRevisionsService {
  constructor(
    @InjectRepository(CircuitRevisionEntity) private readonly revisions: Repository<CircuitRevisionEntity>,
    @InjectRepository(CircuitEntity) private readonly circuits: Repository<CircuitEntity>,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  async list(shopId: string, circuitId: string): Promise<RevisionSummaryDto[]> {
    await this.assertCircuit(shopId, circuitId);
    const rows = await this.revisions.find({ where: { shopId, circuitId }, order: { number: 'ASC' }, relations: { author: true } });
    return rows.map(toRevisionSummaryDto);
  }

  async get(shopId: string, circuitId: string, number: number): Promise<RevisionDto> {
    const revision = await this.revisions
      .createQueryBuilder('revision')
      .addSelect('revision.document')
      .leftJoinAndSelect('revision.author', 'author')
      .where('revision.shop_id = :shopId AND revision.circuit_id = :circuitId AND revision.number = :number', {
        shopId,
        circuitId,
        number,
      })
      .getOne();
    if (!revision) throw new NotFoundError('The revision');
    return toRevisionDto(revision);
  }

  /**
   * The rules check stored when revision `number` was signed off, or null: not signed off, or signed
   * off before sign-offs stored their check (those are checked live, as before).
   */
  async signedOffEvaluation(shopId: string, circuitId: string, number: number): Promise<CircuitEvaluation | null> {
    const revision = await this.revisions
      .createQueryBuilder('revision')
      .select(['revision.id', 'revision.lockedAt'])
      .addSelect('revision.evaluation')
      .where('revision.shop_id = :shopId AND revision.circuit_id = :circuitId AND revision.number = :number', {
        shopId,
        circuitId,
        number,
      })
      .getOne();
    if (!revision) throw new NotFoundError('The revision');
    // Written by the engine at sign-off and locked by a trigger since: trusted as the engine's output.
    return revision.lockedAt && revision.evaluation ? (revision.evaluation as CircuitEvaluation) : null;
  }

  /**
   * Copies the current draft into the next revision number. Runs in one transaction holding a row
   * lock on the circuit, so two snapshots never take the same number and the draft cannot change
   * between reading it and writing the copy. Pass `manager` to join a caller's transaction
   * (e.g. submitting for review also changes the circuit's status).
   */
  async snapshot(
    shopId: string,
    circuitId: string,
    authorId: string,
    message: string,
    manager?: EntityManager,
  ): Promise<RevisionDto> {
    const run = async (tx: EntityManager): Promise<RevisionDto> => {
      const circuit = await tx
        .getRepository(CircuitEntity)
        .createQueryBuilder('circuit')
        .addSelect('circuit.draft')
        .where('circuit.id = :circuitId AND circuit.shop_id = :shopId', { circuitId, shopId })
        .setLock('pessimistic_write')
        .getOne();
      if (!circuit) throw new NotFoundError('The circuit');
      const last = await tx
        .getRepository(CircuitRevisionEntity)
        .createQueryBuilder('revision')
        .select('max(revision.number)', 'max')
        .where('revision.circuit_id = :circuitId', { circuitId })
        .getRawOne<{ max: number | null }>();
      const revisions = tx.getRepository(CircuitRevisionEntity);
      const saved = await revisions.save(
        revisions.create({
          shopId,
          circuitId,
          number: (last?.max ?? 0) + 1,
          // Stored at the current document version, so a revision reads the same forever.
          document: readStoredDocument(circuit.draft),
          draftVersion: circuit.draftVersion,
          authorId,
          message,
        }),
      );
      saved.author = await tx.getRepository(UserEntity).findOneBy({ id: authorId });
      return toRevisionDto(saved);
    };
    return manager ? run(manager) : this.dataSource.transaction(run);
  }

  private async assertCircuit(shopId: string, circuitId: string): Promise<void> {
    if (!(await this.circuits.existsBy({ id: circuitId, shopId }))) throw new NotFoundError('The circuit');
  }
}
