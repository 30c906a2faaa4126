import { demoParts } from '@linesmith/catalog';
import { Test } from '@nestjs/testing';
import { getRepositoryToken } from '@nestjs/typeorm';
import { ConflictError, NotFoundError, ValidationError } from '../common/errors/app-error.js';
import { SuppliersService } from '../suppliers/suppliers.service.js';
import { StockAdjustmentEntity } from '../stock/stock-adjustment.entity.js';
import { updatePartSchema, type ListPartsQuery } from './dto/part-input.schemas.js';
import type { PartDto } from './dto/part.dto.js';
import { PartEntity } from './part.entity.js';
import { OPENING_STOCK_REASON, PartsService } from './parts.service.js';
import { ShopCatalogueService } from './shop-catalogue.service.js';

const SHOP = '11111111-1111-4111-8111-111111111111';
const PART_ID = '33333333-3333-4333-8333-333333333333';
const SUPPLIER = '44444444-4444-4444-8444-444444444444';
const ACTOR = '55555555-5555-4555-8555-555555555555';

const catalogueParts: PartDto[] = demoParts.map((part) => ({ ...part, version: 1 }));
const query = (overrides: Partial<ListPartsQuery> = {}): ListPartsQuery => ({
  includeRetired: false,
  sort: 'description',
  direction: 'asc',
  page: 1,
  pageSize: 50,
  ...overrides,
});

function clampRow(overrides: Partial<PartEntity> = {}): PartEntity {
  return Object.assign(new PartEntity(), {
    id: PART_ID,
    shopId: SHOP,
    supplierId: SUPPLIER,
    kind: 'clamp',
    supplierPartNumber: 'C-1',
    description: 'Cushion clamp',
    priceCents: 500,
    saleUnit: { type: 'each' },
    stockOnHand: 3,
    retired: false,
    attributes: { fitsOd: { minIn: 0.5, maxIn: 0.6 } },
    demoKey: null,
    version: 2,
    ...overrides,
  });
}

describe('PartsService', () => {
  let service: PartsService;
  const repo = {
    findOneBy: jest.fn(),
    create: jest.fn((fields: Partial<PartEntity>) => Object.assign(new PartEntity(), fields)),
    save: jest.fn(),
    update: jest.fn(),
    manager: { transaction: jest.fn() },
  };
  const adjustments = { insert: jest.fn() };
  const catalogue = { partsOf: jest.fn(), invalidate: jest.fn() };
  const suppliers = { existsInShop: jest.fn() };

  beforeEach(async () => {
    jest.resetAllMocks();
    repo.create.mockImplementation((fields: Partial<PartEntity>) => Object.assign(new PartEntity(), fields));
    // One transaction manager whose repositories are the mocks.
    repo.manager.transaction.mockImplementation((work: (manager: unknown) => unknown) =>
      work({ getRepository: (entity: unknown) => (entity === StockAdjustmentEntity ? adjustments : repo) }),
    );
    catalogue.partsOf.mockResolvedValue(catalogueParts);
    const moduleRef = await Test.createTestingModule({
      providers: [
        PartsService,
        { provide: getRepositoryToken(PartEntity), useValue: repo },
        { provide: ShopCatalogueService, useValue: catalogue },
        { provide: SuppliersService, useValue: suppliers },
      ],
    }).compile();
    service = moduleRef.get(PartsService);
  });

  describe('list', () => {
    it('filters the shop catalogue, sorts with numbers in order and pages', async () => {
      const page = await service.list(SHOP, query({ kind: 'hose', pageSize: 3 }));
      expect(catalogue.partsOf).toHaveBeenCalledWith(SHOP);
      expect(page).toMatchObject({ total: 5, page: 1, pageSize: 3 });
      // By description: "-6 CPE…", "-6 PTFE…", "-6 Transmission oil cooler…", then "-8 CPE…", "-8 PTFE…" on page 2.
      expect(page.items.map((part) => part.id)).toEqual(['demo-hose-6-rubber', 'demo-hose-6-ptfe', 'demo-hose-6-cooler']);
      const last = await service.list(SHOP, query({ kind: 'hose', pageSize: 3, page: 2 }));
      expect(last.items.map((part) => part.id)).toEqual(['demo-hose-8-rubber', 'demo-hose-8-ptfe']);
      const dearest = await service.list(SHOP, query({ kind: 'hose', sort: 'priceCents', direction: 'desc', pageSize: 1 }));
      expect(dearest.items[0].id).toBe('demo-hose-8-ptfe');
    });

    it('matches sizes written loosely (6 for -6, M22 x 1.5 for M22x1.5)', async () => {
      const orb = await service.list(SHOP, query({ family: 'orb', size: '6', pageSize: 200 }));
      expect(orb.items.every((part) => JSON.stringify(part.attributes).includes('"size":"-6"'))).toBe(true);
      const metric = await service.list(SHOP, query({ family: 'metric', size: 'm22 x 1.5' }));
      expect(metric.items.map((part) => part.id)).toEqual(['demo-adapter-m22-f37-8']);
    });

    it('answers 400 when fitsHose does not name a hose of the shop', async () => {
      await expect(service.list(SHOP, query({ fitsHose: PART_ID }))).rejects.toMatchObject({ issues: [{ path: 'fitsHose' }] });
    });
  });

  describe('create', () => {
    it('validates with the catalogue schema, checks the supplier belongs to the shop and drops the cache', async () => {
      suppliers.existsInShop.mockResolvedValue(true);
      repo.save.mockImplementation(async (row: PartEntity) => Object.assign(row, { id: PART_ID, version: 1 }));
      const part = await service.create(SHOP, ACTOR, {
        kind: 'clamp',
        supplierId: SUPPLIER,
        description: ' Cushion clamp ',
        attributes: { fitsOd: { minIn: 0.5, maxIn: 0.6 } },
      });
      expect(suppliers.existsInShop).toHaveBeenCalledWith(SHOP, SUPPLIER);
      expect(repo.create).toHaveBeenCalledWith(expect.objectContaining({ shopId: SHOP, description: 'Cushion clamp', priceCents: 0, saleUnit: { type: 'each' } }));
      expect(part).toMatchObject({ id: PART_ID, kind: 'clamp', version: 1, retired: false });
      expect(catalogue.invalidate).toHaveBeenCalledWith(SHOP);
    });

    it('books an opening stock as the first stock adjustment, and writes none without one', async () => {
      repo.save.mockImplementation(async (row: PartEntity) => Object.assign(row, { id: PART_ID, version: 1 }));
      const body = { kind: 'clamp', description: 'Cushion clamp', stockOnHand: 12, attributes: { fitsOd: { minIn: 0.5, maxIn: 0.6 } } };
      await service.create(SHOP, ACTOR, body);
      expect(repo.create).toHaveBeenCalledWith(expect.objectContaining({ stockOnHand: 12 }));
      expect(adjustments.insert).toHaveBeenCalledWith({ shopId: SHOP, partId: PART_ID, delta: 12, reason: OPENING_STOCK_REASON, actorId: ACTOR });
      adjustments.insert.mockClear();
      await service.create(SHOP, ACTOR, { ...body, stockOnHand: 0 });
      expect(adjustments.insert).not.toHaveBeenCalled();
    });

    it('reports attribute problems with their paths and never writes', async () => {
      const attempt = service.create(SHOP, ACTOR, { kind: 'hose', description: 'Hose', attributes: { dash: 6 } });
      await expect(attempt).rejects.toBeInstanceOf(ValidationError);
      const error = (await attempt.catch((caught: unknown) => caught)) as ValidationError;
      expect(error.issues.map((issue) => issue.path)).toEqual(expect.arrayContaining(['attributes.idIn', 'attributes.fluids']));
      expect(repo.save).not.toHaveBeenCalled();
    });

    it('answers 409 when the supplier part number is taken (PostgreSQL 23505)', async () => {
      suppliers.existsInShop.mockResolvedValue(true);
      repo.save.mockRejectedValue(Object.assign(new Error('duplicate key'), { driverError: { code: '23505' } }));
      const body = { kind: 'clamp', supplierId: SUPPLIER, supplierPartNumber: 'C-1', description: 'Clamp', attributes: { fitsOd: { minIn: 0.5, maxIn: 0.6 } } };
      await expect(service.create(SHOP, ACTOR, body)).rejects.toBeInstanceOf(ConflictError);
    });
  });

  describe('update', () => {
    it('merges the changes into the current part and writes with a version guard', async () => {
      repo.findOneBy.mockResolvedValueOnce(clampRow()).mockResolvedValueOnce(clampRow({ priceCents: 650, version: 3 }));
      repo.update.mockResolvedValue({ affected: 1 });
      const part = await service.update(SHOP, PART_ID, { version: 2, priceCents: 650 });
      expect(repo.findOneBy).toHaveBeenCalledWith({ id: PART_ID, shopId: SHOP });
      expect(repo.update).toHaveBeenCalledWith(
        { id: PART_ID, shopId: SHOP, version: 2 },
        expect.objectContaining({ priceCents: 650, kind: 'clamp', attributes: { fitsOd: { minIn: 0.5, maxIn: 0.6 } } }),
      );
      expect(suppliers.existsInShop).not.toHaveBeenCalled();
      expect(part).toMatchObject({ priceCents: 650, version: 3 });
    });

    it('never takes the stock on hand from a change: the schema drops it and the update does not write it', async () => {
      const changes = updatePartSchema.parse({ version: 2, stockOnHand: 999, priceCents: 650 });
      expect(changes).toEqual({ version: 2, priceCents: 650 });
      repo.findOneBy.mockResolvedValue(clampRow());
      repo.update.mockResolvedValue({ affected: 1 });
      await service.update(SHOP, PART_ID, changes);
      expect(repo.update.mock.calls[0][1]).not.toHaveProperty('stockOnHand');
    });

    it('refuses a sale-unit change while stock is on hand (stock counts sale units), and allows it at zero stock', async () => {
      repo.findOneBy.mockResolvedValue(clampRow({ stockOnHand: 3 }));
      const refused = (await service
        .update(SHOP, PART_ID, { version: 2, saleUnit: { type: 'pack', size: 10 } })
        .catch((caught: unknown) => caught)) as ValidationError;
      expect(refused).toBeInstanceOf(ValidationError);
      expect(refused.issues).toEqual([{ path: 'saleUnit', message: expect.stringMatching(/3 piece\(s\) are on hand/) }]);
      expect(repo.update).not.toHaveBeenCalled();

      repo.findOneBy.mockResolvedValue(clampRow({ stockOnHand: 0 }));
      repo.update.mockResolvedValue({ affected: 1 });
      await service.update(SHOP, PART_ID, { version: 2, saleUnit: { type: 'pack', size: 10 } });
      expect(repo.update).toHaveBeenCalledWith({ id: PART_ID, shopId: SHOP, version: 2 }, expect.objectContaining({ saleUnit: { type: 'pack', size: 10 } }));
    });

    it('answers 409 with the current part when the version is stale, 404 for another shop', async () => {
      repo.findOneBy.mockResolvedValue(clampRow({ version: 5 }));
      await expect(service.update(SHOP, PART_ID, { version: 2, priceCents: 1 })).rejects.toMatchObject({
        statusCode: 409,
        extra: { current: { id: PART_ID, version: 5 } },
      });
      repo.findOneBy.mockResolvedValue(null);
      await expect(service.update(SHOP, PART_ID, { version: 2 })).rejects.toBeInstanceOf(NotFoundError);
      expect(repo.update).not.toHaveBeenCalled();
    });
  });
});
