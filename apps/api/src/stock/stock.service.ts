import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { In, type DataSource, type EntityManager, type Repository } from 'typeorm';
import { NotFoundError, ValidationError } from '../common/errors/app-error.js';
import { PartEntity } from '../parts/part.entity.js';
import { ShopCatalogueService } from '../parts/shop-catalogue.service.js';
import { UserEntity } from '../users/user.entity.js';
import type { NewStockAdjustment, StockAdjustmentDto, StockAdjustmentResult } from './dto/stock-adjustment.schemas.js';
import { StockAdjustmentEntity } from './stock-adjustment.entity.js';
import { MAX_STOCK, roundQuantity } from '../common/validation/numbers.js';

function toStockAdjustmentDto(row: StockAdjustmentEntity, actorName?: string): StockAdjustmentDto {
  return {
    id: row.id,
    partId: row.partId,
    delta: row.delta,
    reason: row.reason,
    actorId: row.actorId,
    actor: row.actorId && actorName !== undefined ? { id: row.actorId, displayName: actorName } : null,
    createdAt: row.createdAt.toISOString(),
  };
}

/** Stock on hand and its history: every change is an adjustment row written with the new stock. */
@Injectable()
export class StockService {
  constructor(
    @InjectRepository(StockAdjustmentEntity) private readonly adjustments: Repository<StockAdjustmentEntity>,
    @InjectRepository(PartEntity) private readonly parts: Repository<PartEntity>,
    @InjectRepository(UserEntity) private readonly users: Repository<UserEntity>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly catalogue: ShopCatalogueService,
  ) {}

  async adjust(shopId: string, actorId: string, partId: string, input: NewStockAdjustment): Promise<StockAdjustmentResult> {
    const result = await this.dataSource.transaction((manager) => this.book(manager, shopId, actorId, partId, input));
    this.catalogue.invalidate(shopId);
    return result;
  }

  /**
   * Books one change inside the caller's transaction: locks the part, refuses stock below zero,
   * writes the new stock (bumping the part's version) and the history row.
   */
  async book(manager: EntityManager, shopId: string, actorId: string | null, partId: string, input: NewStockAdjustment): Promise<StockAdjustmentResult> {
    const parts = manager.getRepository(PartEntity);
    const part = await parts.createQueryBuilder('part').where('part.id = :partId AND part.shop_id = :shopId', { partId, shopId }).setLock('pessimistic_write').getOne();
    if (!part) throw new NotFoundError('The part');
    const stockOnHand = roundQuantity(part.stockOnHand + input.delta);
    if (stockOnHand < 0) {
      throw new ValidationError([{ path: 'delta', message: `Only ${part.stockOnHand} on hand; stock cannot go below zero.` }]);
    }
    if (stockOnHand > MAX_STOCK) {
      throw new ValidationError([{ path: 'delta', message: `Stock on hand cannot exceed ${MAX_STOCK}; ${part.stockOnHand} is on hand now.` }]);
    }
    await parts.update({ id: partId, shopId }, { stockOnHand });
    const adjustments = manager.getRepository(StockAdjustmentEntity);
    const saved = await adjustments.save(adjustments.create({ shopId, partId, delta: input.delta, reason: input.reason, actorId }));
    const updated = await parts.findOneByOrFail({ id: partId, shopId });
    return { adjustment: toStockAdjustmentDto(saved), stockOnHand: updated.stockOnHand, version: updated.version };
  }

  async history(shopId: string, partId: string): Promise<StockAdjustmentDto[]> {
    if (!(await this.parts.existsBy({ id: partId, shopId }))) throw new NotFoundError('The part');
    const rows = await this.adjustments.find({ where: { shopId, partId }, order: { createdAt: 'DESC', id: 'ASC' }, take: 500 });
    const actorIds = [...new Set(rows.map((row) => row.actorId).filter((id) => id !== null))];
    const actors = actorIds.length ? await this.users.findBy({ shopId, id: In(actorIds) }) : [];
    const names = new Map(actors.map((user) => [user.id, user.displayName]));
    return rows.map((row) => toStockAdjustmentDto(row, row.actorId ? names.get(row.actorId) : undefined));
  }
}
