import { Test } from '@nestjs/testing';
import { getRepositoryToken } from '@nestjs/typeorm';
import { CircuitEntity } from '../circuits/circuit.entity.js';
import { ConflictError, NotFoundError } from '../common/errors/app-error.js';
import { UserEntity } from '../users/user.entity.js';
import { BuildEntity } from './build.entity.js';
import { BuildsService, escapeLike } from './builds.service.js';

const SHOP = '11111111-1111-4111-8111-111111111111';
const BUILD = '22222222-2222-4222-8222-222222222222';
const USER = '33333333-3333-4333-8333-333333333333';
const author = Object.assign(new UserEntity(), { id: USER, displayName: 'Rafe Okonkwo' });

function buildRow(overrides: Partial<BuildEntity> = {}): BuildEntity {
  return Object.assign(new BuildEntity(), {
    id: BUILD,
    shopId: SHOP,
    vehicleYear: '1974',
    vehicleMake: 'Redfern',
    vehicleModel: 'Pickup',
    vehicleEngine: '',
    vehicleTransmission: '',
    customerName: 'W. Abernathy',
    customerPhone: '',
    customerEmail: '',
    notes: '',
    status: 'open',
    createdById: USER,
    version: 3,
    createdAt: new Date('2026-01-02T03:04:05Z'),
    updatedAt: new Date('2026-01-02T03:04:05Z'),
    ...overrides,
  });
}

/** A chainable stand-in for TypeORM's SelectQueryBuilder that records its calls. */
function recordingBuilder(result: { many?: [BuildEntity[], number]; raw?: unknown[] }) {
  const builder: Record<string, jest.Mock> = {};
  for (const method of ['leftJoinAndSelect', 'where', 'andWhere', 'orderBy', 'addOrderBy', 'offset', 'limit', 'select', 'addSelect', 'groupBy', 'addGroupBy']) {
    builder[method] = jest.fn(() => builder);
  }
  builder.getManyAndCount = jest.fn(async () => result.many ?? [[], 0]);
  builder.getRawMany = jest.fn(async () => result.raw ?? []);
  return builder;
}

describe('BuildsService', () => {
  let service: BuildsService;
  const builds = { createQueryBuilder: jest.fn(), findOneBy: jest.fn(), findOne: jest.fn(), save: jest.fn(), create: jest.fn(), update: jest.fn() };
  const circuits = { createQueryBuilder: jest.fn() };

  beforeEach(async () => {
    jest.resetAllMocks();
    builds.create.mockImplementation((fields: Partial<BuildEntity>) => Object.assign(new BuildEntity(), fields));
    circuits.createQueryBuilder.mockReturnValue(recordingBuilder({ raw: [] }));
    const moduleRef = await Test.createTestingModule({
      providers: [
        BuildsService,
        { provide: getRepositoryToken(BuildEntity), useValue: builds },
        { provide: getRepositoryToken(CircuitEntity), useValue: circuits },
      ],
    }).compile();
    service = moduleRef.get(BuildsService);
  });

  it('lists within the shop: one escaped ILIKE per search word, status filter, customer sort A–Z, paging', async () => {
    const select = recordingBuilder({ many: [[buildRow()], 11] });
    builds.createQueryBuilder.mockReturnValue(select);
    circuits.createQueryBuilder.mockReturnValue(
      recordingBuilder({ raw: [{ buildId: BUILD, status: 'draft', count: 2 }, { buildId: BUILD, status: 'approved', count: 1 }] }),
    );
    const page = await service.list(SHOP, { search: 'redfern 50%', status: ['open', 'on-hold'], sort: 'customer', page: 3, pageSize: 5 });
    expect(select.where).toHaveBeenCalledWith('build.shop_id = :shopId', { shopId: SHOP });
    expect(select.andWhere).toHaveBeenCalledWith('build.status IN (:...statuses)', { statuses: ['open', 'on-hold'] });
    expect(select.andWhere).toHaveBeenCalledWith(expect.stringContaining('ILIKE :term0'), { term0: '%redfern%' });
    expect(select.andWhere).toHaveBeenCalledWith(expect.stringContaining('ILIKE :term1'), { term1: '%50\\%%' });
    expect(select.orderBy).toHaveBeenCalledWith('lower(build.customer_name)', 'ASC');
    expect(select.offset).toHaveBeenCalledWith(10);
    expect(select.limit).toHaveBeenCalledWith(5);
    expect(page).toMatchObject({ total: 11, page: 3, pageSize: 5 });
    expect(page.items[0]).toMatchObject({
      id: BUILD,
      vehicle: { year: '1974', make: 'Redfern', model: 'Pickup' },
      customer: { name: 'W. Abernathy' },
      circuitCounts: { total: 3, byStatus: { draft: 2, approved: 1, 'in-review': 0 } },
    });
  });

  it('sorts dates newest first unless asked otherwise', async () => {
    const select = recordingBuilder({ many: [[], 0] });
    builds.createQueryBuilder.mockReturnValue(select);
    await service.list(SHOP, { sort: 'createdAt', page: 1, pageSize: 50 });
    expect(select.orderBy).toHaveBeenCalledWith('build.created_at', 'DESC');
    await service.list(SHOP, { sort: 'updatedAt', direction: 'asc', page: 1, pageSize: 50 });
    expect(select.orderBy).toHaveBeenLastCalledWith('build.updated_at', 'ASC');
  });

  it('escapes LIKE wildcards', () => {
    expect(escapeLike('100%_\\')).toBe('100\\%\\_\\\\');
  });

  it('creates in the caller shop with the caller as author', async () => {
    builds.save.mockImplementation(async (row: BuildEntity) => Object.assign(row, { id: BUILD, version: 1, createdAt: new Date(), updatedAt: new Date() }));
    builds.findOne.mockImplementation(async () => Object.assign(builds.save.mock.calls[0][0], { createdBy: author }));
    const dto = await service.create(SHOP, USER, { vehicle: { make: 'Redfern' }, customer: {}, notes: '', status: 'open' });
    expect(builds.save.mock.calls[0][0]).toMatchObject({ shopId: SHOP, createdById: USER, vehicleMake: 'Redfern', vehicleModel: '' });
    expect(builds.findOne).toHaveBeenCalledWith({ where: { id: BUILD, shopId: SHOP }, relations: { createdBy: true } });
    expect(dto.circuitCounts.total).toBe(0);
    expect(dto.createdBy).toEqual({ id: USER, displayName: 'Rafe Okonkwo' });
  });

  it('updates with a version guard and answers 409 with the current build when stale', async () => {
    builds.findOneBy.mockResolvedValue(buildRow({ version: 3 }));
    builds.findOne.mockResolvedValue(buildRow({ version: 3 }));
    builds.update.mockResolvedValue({ affected: 1 });
    await service.update(SHOP, BUILD, { version: 3, notes: 'new', customer: { phone: '555-0100' } });
    expect(builds.update).toHaveBeenCalledWith({ id: BUILD, shopId: SHOP, version: 3 }, { notes: 'new', customerPhone: '555-0100' });

    await expect(service.update(SHOP, BUILD, { version: 2, notes: 'x' })).rejects.toMatchObject({
      code: 'conflict',
      extra: { current: { id: BUILD, version: 3 } },
    });
    builds.update.mockResolvedValue({ affected: 0 });
    await expect(service.update(SHOP, BUILD, { version: 3, notes: 'x' })).rejects.toBeInstanceOf(ConflictError);
  });

  it('answers 404 for a build of another shop', async () => {
    builds.findOneBy.mockResolvedValue(null);
    builds.findOne.mockResolvedValue(null);
    await expect(service.get(SHOP, BUILD)).rejects.toBeInstanceOf(NotFoundError);
    expect(builds.findOne).toHaveBeenCalledWith({ where: { id: BUILD, shopId: SHOP }, relations: { createdBy: true } });
    await expect(service.getOwn(SHOP, BUILD)).rejects.toBeInstanceOf(NotFoundError);
    expect(builds.findOneBy).toHaveBeenCalledWith({ id: BUILD, shopId: SHOP });
  });
});
