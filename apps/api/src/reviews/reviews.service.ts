import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import type { CircuitDocument, CircuitEvaluation } from '@linesmith/routing';
import type { DataSource, EntityManager, Repository } from 'typeorm';
import type { AuthUser } from '../auth/auth-user.js';
import { AuditService } from '../audit/audit.service.js';
import { CircuitRevisionEntity } from '../circuits/circuit-revision.entity.js';
import { CircuitRevisionsService } from '../circuits/circuit-revisions.service.js';
import type { CircuitStatus } from '../circuits/circuit-status.js';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import { readStoredDocument } from '../circuits/circuit-document.js';
import { toCircuitDto } from '../circuits/circuit.mapper.js';
import type { CircuitDto } from '../circuits/dto/circuit.dto.js';
import { ConflictError, ForbiddenError, NotFoundError, ValidationError } from '../common/errors/app-error.js';
import { NotificationsService } from '../notifications/notifications.service.js';
import { RulesService } from '../rules/rules.service.js';
import { UserEntity } from '../users/user.entity.js';
import type { AcknowledgeCautionInput, ListReviewsQuery } from './dto/review-input.schemas.js';
import type { AcknowledgementDto, ReviewDto, ReviewQueueRowDto } from './dto/review.dto.js';
import { countFlags, isClear, keyed, openItemsOf } from './open-items.js';
import { ReviewAcknowledgementEntity } from './review-acknowledgement.entity.js';
import { ReviewBlockedError } from './review-errors.js';
import { nextStatus } from './review-transitions.js';
import { ReviewEntity } from './review.entity.js';
import { toAcknowledgementDto, toDecisionDto, toQueueRow, toUserRef } from './review.mapper.js';

/**
 * The review state machine of circuits: submit → (acknowledge …) → approve or return. Every step
 * runs in one transaction holding a row lock on the circuit (so two reviewers cannot race), checks
 * the circuit's status, re-runs the server's rules check where a decision depends on it, and
 * writes its audit event and notifications in the same transaction.
 */
@Injectable()
export class ReviewsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(ReviewEntity) private readonly reviews: Repository<ReviewEntity>,
    @InjectRepository(CircuitEntity) private readonly circuits: Repository<CircuitEntity>,
    private readonly revisions: CircuitRevisionsService,
    private readonly rules: RulesService,
    private readonly audit: AuditService,
    private readonly notifications: NotificationsService,
  ) {}

  /** Snapshots the draft as the next revision and puts it under review. */
  async submit(caller: AuthUser, circuitId: string, message: string): Promise<CircuitDto> {
    const { shopId, userId } = caller;
    await this.dataSource.transaction(async (tx) => {
      const circuit = await this.lockCircuit(tx, shopId, circuitId);
      const status = nextStatus('submit', circuit.status);
      const revision = await this.revisions.snapshot(shopId, circuitId, userId, message, tx);
      const counts = countFlags((await this.rules.evaluate(shopId, revision.document)).flags);
      await tx.getRepository(ReviewEntity).insert({
        shopId,
        circuitId,
        revisionId: revision.id,
        revisionNumber: revision.number,
        status: 'in-review',
        message,
        submittedById: userId,
        ...counts,
      });
      await this.setStatus(tx, circuitId, status);
      await this.audit.record(tx, {
        shopId,
        circuitId,
        actorId: userId,
        action: 'submit',
        revisionNumber: revision.number,
        details: { message, ...counts },
      });
      await this.notifications.notify(
        {
          shopId,
          recipientUserIds: (await this.reviewerIds(tx, shopId)).filter((id) => id !== userId),
          subject: `Review requested: ${circuit.name}, revision ${revision.number}`,
          body:
            `Revision ${revision.number} of "${circuit.name}" is waiting for sign-off ` +
            `(${counts.blockers} blocker(s), ${counts.cautions} caution(s) at submission).` +
            (message ? `\n\nMessage from the fabricator: ${message}` : ''),
        },
        tx,
      );
    });
    return toCircuitDto(await this.circuitOf(shopId, circuitId));
  }

  /** The review queue: one row per submission in `status`. */
  async queue(shopId: string, query: ListReviewsQuery): Promise<ReviewQueueRowDto[]> {
    const direction = query.direction === 'desc' ? 'DESC' : 'ASC';
    const builder = this.reviews
      .createQueryBuilder('review')
      .innerJoinAndSelect('review.circuit', 'circuit')
      .innerJoinAndSelect('circuit.build', 'build')
      .leftJoinAndSelect('review.submittedBy', 'fabricator')
      .where('review.shop_id = :shopId AND review.status = :status', { shopId, status: query.status });
    if (query.sort === 'build') {
      builder
        .orderBy('build.vehicle_year', direction)
        .addOrderBy('build.vehicle_make', direction)
        .addOrderBy('build.vehicle_model', direction)
        .addOrderBy('build.customer_name', direction)
        .addOrderBy('build.id', direction)
        .addOrderBy('review.submitted_at', 'ASC');
    } else {
      builder.orderBy('review.submitted_at', direction);
    }
    const rows = await builder.addOrderBy('review.id', 'ASC').take(query.limit).getMany();
    return rows.map(toQueueRow);
  }

  /** The review under way, or the last one decided, with the revision checked again now. */
  async get(shopId: string, circuitId: string): Promise<ReviewDto> {
    const circuit = await this.circuitOf(shopId, circuitId);
    const review = await this.reviews
      .createQueryBuilder('review')
      .leftJoinAndSelect('review.submittedBy', 'submittedBy')
      .leftJoinAndSelect('review.decidedBy', 'decidedBy')
      .where('review.shop_id = :shopId AND review.circuit_id = :circuitId', { shopId, circuitId })
      .orderBy('review.submitted_at', 'DESC')
      .addOrderBy('review.revision_number', 'DESC')
      .getOne();
    if (!review) throw new NotFoundError('A review of this circuit');
    const document = await this.revisionDocument(this.dataSource.manager, review.revisionId);
    const evaluation = await this.rules.evaluate(shopId, document);
    const acknowledgements = await this.dataSource.getRepository(ReviewAcknowledgementEntity).find({
      where: { reviewId: review.id },
      relations: { by: true },
      order: { createdAt: 'ASC', id: 'ASC' },
    });
    const decision = toDecisionDto(review);
    return {
      reviewId: review.id,
      circuitId,
      status: review.status,
      circuitStatus: circuit.status,
      revisionNumber: review.revisionNumber,
      message: review.message,
      document,
      evaluation,
      acknowledgements: acknowledgements.map(toAcknowledgementDto),
      ...(decision ? { decision } : {}),
      submittedBy: toUserRef(review.submittedBy),
      submittedAt: review.submittedAt.toISOString(),
      openItems: openItemsOf(evaluation.flags, new Set(acknowledgements.map((ack) => ack.flagKey))),
    };
  }

  /** Accepts one caution of the revision under review with a note. Blockers and notes cannot be acknowledged. */
  async acknowledge(caller: AuthUser, circuitId: string, input: AcknowledgeCautionInput): Promise<AcknowledgementDto> {
    const { shopId, userId } = caller;
    const id = await this.dataSource.transaction(async (tx) => {
      const circuit = await this.lockCircuit(tx, shopId, circuitId);
      nextStatus('acknowledge', circuit.status);
      const review = await this.openReview(tx, circuitId);
      this.refuseOwnSubmission(review, userId, 'acknowledge its cautions');
      const evaluation = await this.evaluateRevision(tx, shopId, review.revisionId);
      const flag = evaluation.flags.map(keyed).find((candidate) => candidate.key === input.flagKey);
      if (!flag) {
        throw new ValidationError([{ path: 'flagKey', message: 'The revision under review has no flag with this key.' }]);
      }
      if (flag.severity !== 'caution') {
        const why =
          flag.severity === 'blocker'
            ? 'A blocker cannot be acknowledged: the fabricator must fix it, or return the circuit.'
            : 'Notes need no acknowledgement.';
        throw new ValidationError([{ path: 'flagKey', message: why }], why);
      }
      const acks = tx.getRepository(ReviewAcknowledgementEntity);
      if (await acks.existsBy({ reviewId: review.id, flagKey: flag.key })) {
        throw new ConflictError('This caution is already acknowledged.');
      }
      const inserted = await acks.insert({ shopId, reviewId: review.id, flagKey: flag.key, note: input.note, byId: userId });
      await this.audit.record(tx, {
        shopId,
        circuitId,
        actorId: userId,
        action: 'acknowledge',
        revisionNumber: review.revisionNumber,
        details: { flagKey: flag.key, code: flag.code, message: flag.message, note: input.note },
      });
      return inserted.identifiers[0]!.id as string;
    });
    const saved = await this.dataSource
      .getRepository(ReviewAcknowledgementEntity)
      .findOneOrFail({ where: { id }, relations: { by: true } });
    return toAcknowledgementDto(saved);
  }

  /**
   * Signs the revision off: refused while a fresh check finds a blocker or an unacknowledged
   * caution, and to the user who submitted it. Locks the revision for good, with that check stored on it.
   */
  async approve(caller: AuthUser, circuitId: string, note: string): Promise<ReviewDto> {
    const { shopId, userId } = caller;
    await this.dataSource.transaction(async (tx) => {
      const circuit = await this.lockCircuit(tx, shopId, circuitId);
      const status = nextStatus('approve', circuit.status);
      const review = await this.openReview(tx, circuitId);
      this.refuseOwnSubmission(review, userId, 'approve it');
      const evaluation = await this.evaluateRevision(tx, shopId, review.revisionId);
      const acknowledged = await tx.getRepository(ReviewAcknowledgementEntity).find({ where: { reviewId: review.id } });
      const open = openItemsOf(evaluation.flags, new Set(acknowledged.map((ack) => ack.flagKey)));
      if (!isClear(open)) throw new ReviewBlockedError(open);

      await this.decide(tx, review.id, 'approved', userId, note);
      const locked = await tx
        .createQueryBuilder()
        .update(CircuitRevisionEntity)
        // The check just passed is stored with the lock: exports and orders use these numbers from now on.
        .set({ lockedAt: () => 'clock_timestamp()', approvedAt: () => 'clock_timestamp()', approvedById: userId, evaluation })
        .where('id = :id AND locked_at IS NULL', { id: review.revisionId })
        .execute();
      if (!locked.affected) throw new ConflictError('This revision is already locked by an earlier sign-off.');
      await this.setStatus(tx, circuitId, status);
      await this.audit.record(tx, {
        shopId,
        circuitId,
        actorId: userId,
        action: 'approve',
        revisionNumber: review.revisionNumber,
        details: { note, acknowledgedCautions: acknowledged.length },
      });
      await this.notifications.notify(
        {
          shopId,
          recipientUserIds: review.submittedById ? [review.submittedById] : [],
          subject: `Approved: ${circuit.name}, revision ${review.revisionNumber}`,
          body:
            `Revision ${review.revisionNumber} of "${circuit.name}" is signed off and locked.` +
            (note ? `\n\nNote from the reviewer: ${note}` : ''),
        },
        tx,
      );
    });
    return this.get(shopId, circuitId);
  }

  /** Sends the circuit back to the fabricator with the reviewer's comments. */
  async returnToFabricator(caller: AuthUser, circuitId: string, comments: string): Promise<ReviewDto> {
    const { shopId, userId } = caller;
    await this.dataSource.transaction(async (tx) => {
      const circuit = await this.lockCircuit(tx, shopId, circuitId);
      const status = nextStatus('return', circuit.status);
      const review = await this.openReview(tx, circuitId);
      await this.decide(tx, review.id, 'returned', userId, comments);
      await this.setStatus(tx, circuitId, status);
      await this.audit.record(tx, {
        shopId,
        circuitId,
        actorId: userId,
        action: 'return',
        revisionNumber: review.revisionNumber,
        details: { comments },
      });
      await this.notifications.notify(
        {
          shopId,
          recipientUserIds: review.submittedById ? [review.submittedById] : [],
          subject: `Returned: ${circuit.name}, revision ${review.revisionNumber}`,
          body: `Revision ${review.revisionNumber} of "${circuit.name}" was returned for changes.\n\nComments: ${comments}`,
        },
        tx,
      );
    });
    return this.get(shopId, circuitId);
  }

  /** `SELECT … FOR UPDATE` on the circuit: every review step of one circuit runs one at a time. */
  private async lockCircuit(tx: EntityManager, shopId: string, circuitId: string): Promise<CircuitEntity> {
    const circuit = await tx
      .getRepository(CircuitEntity)
      .createQueryBuilder('circuit')
      .where('circuit.id = :circuitId AND circuit.shop_id = :shopId', { circuitId, shopId })
      .setLock('pessimistic_write')
      .getOne();
    if (!circuit) throw new NotFoundError('The circuit');
    return circuit;
  }

  /** A status change moves the circuit's `version` (its fields' guard), never its draft version. */
  private async setStatus(tx: EntityManager, circuitId: string, status: CircuitStatus): Promise<void> {
    await tx
      .createQueryBuilder()
      .update(CircuitEntity)
      .set({ status, version: () => '"version" + 1', updatedAt: () => 'now()' })
      .where('id = :circuitId', { circuitId })
      .execute();
  }

  private async decide(tx: EntityManager, reviewId: string, status: 'approved' | 'returned', userId: string, note: string) {
    await tx
      .createQueryBuilder()
      .update(ReviewEntity)
      .set({ status, decidedById: userId, decidedAt: () => 'clock_timestamp()', decisionNote: note })
      .where('id = :reviewId', { reviewId })
      .execute();
  }

  private async openReview(tx: EntityManager, circuitId: string): Promise<ReviewEntity> {
    const review = await tx.getRepository(ReviewEntity).findOneBy({ circuitId, status: 'in-review' });
    if (!review) throw new NotFoundError('The review under way');
    return review;
  }

  private refuseOwnSubmission(review: ReviewEntity, userId: string, what: string): void {
    if (review.submittedById === userId) {
      throw new ForbiddenError(`You submitted this revision, so someone else must ${what}.`);
    }
  }

  private async revisionDocument(manager: EntityManager, revisionId: string): Promise<CircuitDocument> {
    const revision = await manager
      .getRepository(CircuitRevisionEntity)
      .createQueryBuilder('revision')
      .addSelect('revision.document')
      .where('revision.id = :revisionId', { revisionId })
      .getOneOrFail();
    return readStoredDocument(revision.document);
  }

  private async evaluateRevision(tx: EntityManager, shopId: string, revisionId: string): Promise<CircuitEvaluation> {
    return this.rules.evaluate(shopId, await this.revisionDocument(tx, revisionId));
  }

  /** Active reviewers of the shop; where the shop has none, its admins. */
  private async reviewerIds(tx: EntityManager, shopId: string): Promise<string[]> {
    const withRole = (role: string) =>
      tx
        .getRepository(UserEntity)
        .createQueryBuilder('user')
        .select('user.id')
        .where('user.shop_id = :shopId AND user.active AND :role = ANY(user.roles)', { shopId, role })
        .getMany();
    const reviewers = await withRole('reviewer');
    return (reviewers.length ? reviewers : await withRole('admin')).map((user) => user.id);
  }

  private async circuitOf(shopId: string, circuitId: string): Promise<CircuitEntity> {
    const circuit = await this.circuits.findOneBy({ id: circuitId, shopId });
    if (!circuit) throw new NotFoundError('The circuit');
    return circuit;
  }
}
