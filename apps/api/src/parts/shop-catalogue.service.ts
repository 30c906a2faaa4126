import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import type { PartDto } from './dto/part.dto.js';
import { PartEntity } from './part.entity.js';
import { toPartDto } from './part.mapper.js';

/**
 * One text that changes whenever a shop's parts do (row count, sum of versions, latest change), as
 * a scalar sub-select over the shop id in parameter `$<n>`: callers that need other rows in the
 * same round trip (the rules check) embed it in their own query.
 */
export function catalogueFingerprintSql(shopParam: number): string {
  return `(SELECT count(*)::text || '|' || coalesce(sum(p."version"), 0)::text || '|' ||
      coalesce(to_char(max(p."updated_at"), 'YYYY-MM-DD"T"HH24:MI:SS.US'), '')
    FROM "parts" p WHERE p."shop_id" = $${shopParam})`;
}

interface CachedCatalogue {
  fingerprint: string;
  parts: readonly PartDto[];
}

/**
 * A shop's whole catalogue in memory, for the list filters, the adapter solver and the rules
 * engine, one entry per shop. Each read compares a fresh fingerprint from PostgreSQL, so writes
 * from another process or the seed are seen too; writes through this process also drop the entry
 * at once. The same array is returned until the catalogue changes, which lets the solver reuse its
 * per-catalogue index.
 */
@Injectable()
export class ShopCatalogueService {
  private readonly cache = new Map<string, CachedCatalogue>();

  constructor(@InjectRepository(PartEntity) private readonly parts: Repository<PartEntity>) {}

  async partsOf(shopId: string): Promise<readonly PartDto[]> {
    const [row] = (await this.parts.query(`SELECT ${catalogueFingerprintSql(1)} AS "fingerprint"`, [shopId])) as Array<{
      fingerprint: string;
    }>;
    return this.partsAt(shopId, row?.fingerprint ?? '');
  }

  /** The shop's parts as of `fingerprint`, read just now with `catalogueFingerprintSql`. */
  async partsAt(shopId: string, fingerprint: string): Promise<readonly PartDto[]> {
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
}
