import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { partSchema, type HosePart } from '@linesmith/catalog';
import type { QueryDeepPartialEntity, Repository } from 'typeorm';
import { z } from 'zod';
import { ConflictError, NotFoundError, ValidationError } from '../common/errors/app-error.js';
import { isUniqueViolation } from '../common/errors/unique-violation.js';
import { parseWithSchema } from '../common/validation/zod-validation.pipe.js';
import { StockAdjustmentEntity } from '../stock/stock-adjustment.entity.js';
import { SuppliersService } from '../suppliers/suppliers.service.js';
import type { Page } from '../users/users.service.js';
import type { ListPartsQuery, NewPartBody, PartChanges, PartFields } from './dto/part-input.schemas.js';
import type { PartDto } from './dto/part.dto.js';
import { matchesPartFilter, sortParts } from './part-filters.js';
import { PartEntity } from './part.entity.js';
import { toPartColumns, toPartDto } from './part.mapper.js';
import { saleUnitChangeRefusal } from './sale-unit-change.js';
import { ShopCatalogueService } from './shop-catalogue.service.js';

const uuid = z.uuid();

// The id `partSchema` asks for while a part is not saved yet; it never reaches the database.
const UNSAVED_ID = 'unsaved';

/** The reason of the stock adjustment that books a new part's opening stock. */
export const OPENING_STOCK_REASON = 'Opening stock';

/**
 * Checks a whole part with the catalogue library's `partSchema` — the one definition of a valid
 * part, kind-specific attributes included; failures answer 400 with the path of each issue.
 */
function validatePart(body: Record<string, unknown>, id = UNSAVED_ID): PartFields {
  const { id: _id, ...fields } = parseWithSchema(partSchema, { ...body, id });
  return fields;
}

/** Catalogue parts of one shop. Every method takes the caller's shopId; ids of another shop answer 404. */
@Injectable()
export class PartsService {
  constructor(
    @InjectRepository(PartEntity) private readonly parts: Repository<PartEntity>,
    private readonly catalogue: ShopCatalogueService,
    private readonly suppliers: SuppliersService,
  ) {}

  async list(shopId: string, query: ListPartsQuery): Promise<Page<PartDto>> {
    const all = await this.catalogue.partsOf(shopId);
    const fitsHose = query.fitsHose ? this.hoseIn(all, query.fitsHose) : undefined;
    const matching = all.filter((part) => matchesPartFilter(part, { ...query, fitsHose }));
    const sorted = sortParts(matching, query.sort, query.direction);
    const start = (query.page - 1) * query.pageSize;
    return { items: sorted.slice(start, start + query.pageSize), total: sorted.length, page: query.page, pageSize: query.pageSize };
  }

  async get(shopId: string, partId: string): Promise<PartDto> {
    return toPartDto(await this.getOwn(shopId, partId));
  }

  /** A new part; an opening stock is booked as the part's first stock adjustment, so its history starts with it. */
  async create(shopId: string, actorId: string, body: NewPartBody): Promise<PartDto> {
    const fields = validatePart(body);
    await this.assertOwnSupplier(shopId, fields.supplierId);
    const saved = await this.write(() =>
      this.parts.manager.transaction(async (manager) => {
        const parts = manager.getRepository(PartEntity);
        const row = await parts.save(parts.create({ ...toPartColumns(fields), stockOnHand: fields.stockOnHand, shopId, demoKey: null }));
        if (fields.stockOnHand !== 0) {
          await manager
            .getRepository(StockAdjustmentEntity)
            .insert({ shopId, partId: row.id, delta: fields.stockOnHand, reason: OPENING_STOCK_REASON, actorId });
        }
        return row;
      }),
    );
    this.catalogue.invalidate(shopId);
    return toPartDto(saved);
  }

  /**
   * Merges the changed fields into the current part (attributes are replaced whole) and checks
   * the result with the library's `partSchema`. A stale version answers 409 with the current part.
   */
  async update(shopId: string, partId: string, changes: PartChanges): Promise<PartDto> {
    const current = await this.getOwn(shopId, partId);
    if (current.version !== changes.version) throw this.staleVersion(current);
    const { version, ...edits } = changes;
    const { version: _current, ...currentPart } = toPartDto(current);
    const fields = validatePart({ ...currentPart, ...edits }, partId);
    if (fields.supplierId !== current.supplierId) await this.assertOwnSupplier(shopId, fields.supplierId);
    // The version guard below also fails if a stock adjustment lands meanwhile (it moves the version).
    const refusal = saleUnitChangeRefusal(current.saleUnit, fields.saleUnit, current.stockOnHand);
    if (refusal) throw new ValidationError([{ path: 'saleUnit', message: refusal }], refusal);
    const result = await this.write(() => this.parts.update({ id: partId, shopId, version }, toPartColumns(fields) as QueryDeepPartialEntity<PartEntity>));
    this.catalogue.invalidate(shopId);
    if (!result.affected) throw this.staleVersion(await this.getOwn(shopId, partId));
    return toPartDto(await this.getOwn(shopId, partId));
  }

  /**
   * Deletes a part nobody uses yet (e.g. entered by mistake). A part named by any circuit draft or
   * revision, or by an order, answers 409: retire it instead, so approved records keep their parts.
   */
  async remove(shopId: string, partId: string): Promise<void> {
    const part = await this.getOwn(shopId, partId);
    const quoted = `%${JSON.stringify(partId)}%`;
    const [usage] = (await this.parts.manager.query(
      `SELECT
         EXISTS (SELECT 1 FROM "circuits" WHERE "shop_id" = $1 AND "draft"::text LIKE $2) AS "inDraft",
         EXISTS (SELECT 1 FROM "circuit_revisions" WHERE "shop_id" = $1 AND "document"::text LIKE $2) AS "inRevision",
         EXISTS (SELECT 1 FROM "order_lines" WHERE "part_id" = $3) AS "inOrder"`,
      [shopId, quoted, partId],
    )) as Array<{ inDraft: boolean; inRevision: boolean; inOrder: boolean }>;
    if (usage.inDraft || usage.inRevision || usage.inOrder) {
      throw new ConflictError('This part is used by a circuit or an order, so it cannot be deleted. Retire it instead.', {
        current: toPartDto(part),
      });
    }
    await this.parts.delete({ id: partId, shopId });
    this.catalogue.invalidate(shopId);
  }

  private async getOwn(shopId: string, partId: string): Promise<PartEntity> {
    const part = await this.parts.findOneBy({ id: partId, shopId });
    if (!part) throw new NotFoundError('The part');
    return part;
  }

  private hoseIn(parts: readonly PartDto[], hoseId: string): HosePart {
    const hose = parts.find((part) => part.id === hoseId);
    if (hose?.kind !== 'hose') {
      throw new ValidationError([{ path: 'fitsHose', message: 'There is no hose with this id in your catalogue.' }]);
    }
    return hose;
  }

  private async assertOwnSupplier(shopId: string, supplierId: string | null): Promise<void> {
    if (supplierId === null) return;
    if (uuid.safeParse(supplierId).success && (await this.suppliers.existsInShop(shopId, supplierId))) return;
    throw new ValidationError([{ path: 'supplierId', message: 'Choose one of your suppliers.' }]);
  }

  private async write<T>(operation: () => Promise<T>): Promise<T> {
    try {
      return await operation();
    } catch (error) {
      if (isUniqueViolation(error)) {
        throw new ConflictError('This supplier already has a part with this part number in your catalogue.');
      }
      throw error;
    }
  }

  private staleVersion(current: PartEntity): ConflictError {
    return new ConflictError('This part was changed by someone else. Review the current values and try again.', {
      current: toPartDto(current),
    });
  }
}
