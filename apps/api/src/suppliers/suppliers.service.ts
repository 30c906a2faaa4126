import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { FindOptionsWhere, Repository } from 'typeorm';
import { ConflictError, NotFoundError } from '../common/errors/app-error.js';
import { isUniqueViolation } from '../common/errors/unique-violation.js';
import type { ListSuppliersQuery, NewSupplier, SupplierChanges } from './dto/supplier-input.schemas.js';
import type { SupplierDto } from './dto/supplier.dto.js';
import { SupplierEntity } from './supplier.entity.js';
import { toSupplierDto } from './supplier.mapper.js';

/** Suppliers of one shop. Every method takes the caller's shopId; ids of another shop answer 404. */
@Injectable()
export class SuppliersService {
  constructor(@InjectRepository(SupplierEntity) private readonly suppliers: Repository<SupplierEntity>) {}

  async list(shopId: string, query: ListSuppliersQuery): Promise<SupplierDto[]> {
    const where: FindOptionsWhere<SupplierEntity> = { shopId };
    if (!query.includeInactive) where.active = true;
    const rows = await this.suppliers.find({ where, order: { name: 'ASC', id: 'ASC' } });
    return rows.map(toSupplierDto);
  }

  async getOwn(shopId: string, supplierId: string): Promise<SupplierEntity> {
    const supplier = await this.suppliers.findOneBy({ id: supplierId, shopId });
    if (!supplier) throw new NotFoundError('The supplier');
    return supplier;
  }

  /** Whether the id names a supplier of this shop (parts may only point at their own shop's suppliers). */
  existsInShop(shopId: string, supplierId: string): Promise<boolean> {
    return this.suppliers.existsBy({ id: supplierId, shopId });
  }

  async create(shopId: string, input: NewSupplier): Promise<SupplierEntity> {
    try {
      return await this.suppliers.save(this.suppliers.create({ ...input, shopId, demoKey: null }));
    } catch (error) {
      if (isUniqueViolation(error)) throw this.nameTaken();
      throw error;
    }
  }

  /** Applies an edit made against `changes.version`; a stale version answers 409 with the current supplier. */
  async update(shopId: string, supplierId: string, changes: SupplierChanges): Promise<SupplierEntity> {
    const supplier = await this.getOwn(shopId, supplierId);
    if (supplier.version !== changes.version) throw this.staleVersion(supplier);
    const { version, ...fields } = changes;
    const updates = Object.fromEntries(Object.entries(fields).filter(([, value]) => value !== undefined));
    if (Object.keys(updates).length === 0) return supplier;
    try {
      const result = await this.suppliers.update({ id: supplierId, shopId, version }, updates);
      if (!result.affected) throw this.staleVersion(await this.getOwn(shopId, supplierId));
    } catch (error) {
      if (isUniqueViolation(error)) throw this.nameTaken();
      throw error;
    }
    return this.getOwn(shopId, supplierId);
  }

  private nameTaken(): ConflictError {
    return new ConflictError('A supplier with this name already exists.');
  }

  private staleVersion(current: SupplierEntity): ConflictError {
    return new ConflictError('This supplier was changed by someone else. Review the current values and try again.', {
      current: toSupplierDto(current),
    });
  }
}
