import { Test } from '@nestjs/testing';
import { getRepositoryToken } from '@nestjs/typeorm';
import { ConflictError, NotFoundError } from '../common/errors/app-error.js';
import { SupplierEntity } from './supplier.entity.js';
import { SuppliersService } from './suppliers.service.js';

const SHOP = '11111111-1111-4111-8111-111111111111';
const SUPPLIER = '44444444-4444-4444-8444-444444444444';

function supplierRow(overrides: Partial<SupplierEntity> = {}): SupplierEntity {
  return Object.assign(new SupplierEntity(), {
    id: SUPPLIER,
    shopId: SHOP,
    name: 'Harbor Line Supply',
    email: 'orders@harborline.example',
    accountNumber: 'HLS-1',
    phone: '',
    notes: '',
    active: true,
    demoKey: null,
    version: 2,
    createdAt: new Date('2026-01-02T03:04:05Z'),
    updatedAt: new Date('2026-01-02T03:04:05Z'),
    ...overrides,
  });
}

describe('SuppliersService', () => {
  let service: SuppliersService;
  const repo = { find: jest.fn(), findOneBy: jest.fn(), existsBy: jest.fn(), create: jest.fn(), save: jest.fn(), update: jest.fn() };

  beforeEach(async () => {
    jest.resetAllMocks();
    repo.create.mockImplementation((fields: Partial<SupplierEntity>) => Object.assign(new SupplierEntity(), fields));
    const moduleRef = await Test.createTestingModule({
      providers: [SuppliersService, { provide: getRepositoryToken(SupplierEntity), useValue: repo }],
    }).compile();
    service = moduleRef.get(SuppliersService);
  });

  it('lists the active suppliers of the caller shop by name unless asked for all', async () => {
    repo.find.mockResolvedValue([supplierRow()]);
    const list = await service.list(SHOP, { includeInactive: false });
    expect(repo.find).toHaveBeenCalledWith({ where: { shopId: SHOP, active: true }, order: { name: 'ASC', id: 'ASC' } });
    expect(list[0]).toMatchObject({ id: SUPPLIER, name: 'Harbor Line Supply', createdAt: '2026-01-02T03:04:05.000Z' });
    await service.list(SHOP, { includeInactive: true });
    expect(repo.find).toHaveBeenLastCalledWith({ where: { shopId: SHOP }, order: { name: 'ASC', id: 'ASC' } });
  });

  it('answers 409 for a name the shop already uses', async () => {
    repo.save.mockRejectedValue(Object.assign(new Error('duplicate key'), { driverError: { code: '23505' } }));
    const input = { name: 'Harbor Line Supply', email: '', accountNumber: '', phone: '', notes: '', active: true };
    await expect(service.create(SHOP, input)).rejects.toBeInstanceOf(ConflictError);
    expect(repo.create).toHaveBeenCalledWith({ ...input, shopId: SHOP, demoKey: null });
  });

  it('updates with a version guard; stale versions answer 409 with the current supplier', async () => {
    repo.findOneBy.mockResolvedValueOnce(supplierRow()).mockResolvedValueOnce(supplierRow({ phone: '555-0100', version: 3 }));
    repo.update.mockResolvedValue({ affected: 1 });
    const updated = await service.update(SHOP, SUPPLIER, { version: 2, phone: '555-0100' });
    expect(repo.update).toHaveBeenCalledWith({ id: SUPPLIER, shopId: SHOP, version: 2 }, { phone: '555-0100' });
    expect(updated.version).toBe(3);

    repo.findOneBy.mockResolvedValue(supplierRow({ version: 4 }));
    await expect(service.update(SHOP, SUPPLIER, { version: 2, phone: 'x' })).rejects.toMatchObject({
      statusCode: 409,
      extra: { current: { version: 4 } },
    });
    repo.findOneBy.mockResolvedValue(null);
    await expect(service.update(SHOP, SUPPLIER, { version: 2 })).rejects.toBeInstanceOf(NotFoundError);
  });
});
