import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import type { PartDto } from './dto/part.dto.js';
import { PartEntity } from './part.entity.js';
import { toPartDto } from './part.mapper.js';

interface CachedCatalogue {
  fingerprint: string;
  parts: readonly PartDto[];
}

/**
 * A shop's whole catalogue in memory, for the list filters, the adapter solver and the rules
 * engine. Each read asks PostgreSQL for a cheap fingerprint (row count, sum of versions, latest
 * change), so writes from another process or the seed are seen too; writes through this process
 * also drop the entry at once. The same array is returned until the catalogue changes, which lets
 * the solver reuse its per-catalogue index.
 */
@Injectable()
export class ShopCatalogueService {
  private readonly cache = new Map<string, CachedCatalogue>();

  constructor(@InjectRepository(PartEntity) private readonly parts: Repository<PartEntity>) {}

  async partsOf(shopId: string): Promise<readonly PartDto[]> {
    const fingerprint = await this.fingerprintOf(shopId);
    const cached = this.cache.get(shopId);
    if (cached?.fingerprint === fingerprint) return cached.parts;
    // Read after the fingerprint: the rows are at least as new as it, so a race only costs a reload.
    const rows = await this.parts.find({ where: { shopId }, order: { id: 'ASC' } });
    const parts = Object.freeze(rows.map(toPartDto));
    this.cache.set(shopId, { fingerprint, parts });
    return parts;
  }

  invalidate(shopId: string): void {
    this.cache.delete(shopId);
  }

  private async fingerprintOf(shopId: string): Promise<string> {
    const row = await this.parts
      .createQueryBuilder('part')
      .select('count(*)::int', 'count')
      .addSelect('coalesce(sum(part.version), 0)::bigint', 'versions')
      .addSelect("coalesce(to_char(max(part.updatedAt), 'YYYY-MM-DD\"T\"HH24:MI:SS.US'), '')", 'latest')
      .where('part.shopId = :shopId', { shopId })
      .getRawOne<{ count: number; versions: string; latest: string }>();
    return `${row?.count ?? 0}|${row?.versions ?? 0}|${row?.latest ?? ''}`;
  }
}
