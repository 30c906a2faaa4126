import { demoParts, demoSuppliers, partSchema } from '@linesmith/catalog';
import type { EntityManager } from 'typeorm';
import { PartEntity } from '../../parts/part.entity.js';
import { toPartColumns } from '../../parts/part.mapper.js';
import { SupplierEntity } from '../../suppliers/supplier.entity.js';
import type { SeedStep } from './seed-context.js';

/** JSON with sorted keys, so values read back from jsonb compare equal to the source. */
function stableJson(value: unknown): string {
  return JSON.stringify(value, (_key, inner: unknown) =>
    inner && typeof inner === 'object' && !Array.isArray(inner)
      ? Object.fromEntries(Object.entries(inner).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)))
      : inner,
  );
}

/** Copies `fields` onto the row and says whether anything changed (unchanged rows keep their version). */
function assignChanged<T extends object>(row: T, fields: Partial<T>): boolean {
  let changed = false;
  for (const [key, value] of Object.entries(fields) as Array<[keyof T, T[keyof T]]>) {
    if (stableJson(row[key]) !== stableJson(value)) {
      row[key] = value;
      changed = true;
    }
  }
  return changed;
}

/**
 * Upserts the invented demo suppliers and parts of the catalogue library for the demo shop,
 * found again by their demo ids (`demo_key`), so running the seed twice changes nothing.
 */
export const seedDemoCatalogue: SeedStep = {
  name: 'demo catalogue',
  async run(context) {
    const shop = context.demoShop;
    if (!shop) throw new Error('The demo shop must be seeded before its catalogue.');
    const suppliers = context.manager.getRepository(SupplierEntity);
    const supplierIds = new Map<string, string>();
    for (const demo of demoSuppliers) {
      const existing = await suppliers.findOneBy({ shopId: shop.id, demoKey: demo.id });
      const row = existing ?? suppliers.create({ shopId: shop.id, demoKey: demo.id, phone: '', notes: '', active: true });
      const changed = assignChanged(row, { name: demo.name, email: demo.email, accountNumber: demo.accountNumber });
      const saved = changed || !existing ? await suppliers.save(row) : row;
      supplierIds.set(demo.id, saved.id);
    }

    const parts = context.manager.getRepository(PartEntity);
    const existingParts = new Map(
      (await parts.findBy({ shopId: shop.id })).filter((row) => row.demoKey !== null).map((row) => [row.demoKey, row]),
    );
    let created = 0;
    let updated = 0;
    for (const demo of demoParts) {
      const { id: demoKey, ...fields } = partSchema.parse({
        ...demo,
        supplierId: demo.supplierId === null ? null : supplierIds.get(demo.supplierId) ?? null,
      });
      const existing = existingParts.get(demoKey);
      const row = existing ?? parts.create({ shopId: shop.id, demoKey });
      if (!assignChanged(row, toPartColumns(fields)) && existing) continue;
      await parts.save(row);
      if (existing) updated += 1;
      else created += 1;
    }
    context.log(`demo catalogue: ${demoSuppliers.length} suppliers, ${created} parts created, ${updated} updated`);
  },
};

/**
 * Database ids of a shop's seeded demo parts by their demo id (e.g. `demo-hose-6-rubber`), for
 * seed steps that write circuit documents referring to parts.
 */
export async function demoPartIds(manager: EntityManager, shopId: string): Promise<Map<string, string>> {
  const rows = await manager
    .getRepository(PartEntity)
    .createQueryBuilder('part')
    .select(['part.id', 'part.demoKey'])
    .where('part.shopId = :shopId AND part.demoKey IS NOT NULL', { shopId })
    .getMany();
  return new Map(rows.map((row) => [row.demoKey as string, row.id]));
}

/** The database id of one seeded demo part; throws when the demo catalogue has not been seeded. */
export async function demoPartId(manager: EntityManager, shopId: string, demoId: string): Promise<string> {
  const id = (await demoPartIds(manager, shopId)).get(demoId);
  if (!id) throw new Error(`Demo part "${demoId}" is not in the shop's catalogue; seed the demo catalogue first.`);
  return id;
}
