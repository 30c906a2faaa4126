import { defaultShopRules, shopRulesSchema } from '@linesmith/routing';
import { Test } from '@nestjs/testing';
import { getRepositoryToken } from '@nestjs/typeorm';
import { ConflictError } from '../common/errors/app-error.js';
import { ShopRulesEntity } from './shop-rules.entity.js';
import { ShopRulesService } from './shop-rules.service.js';

const SHOP = '11111111-1111-4111-8111-111111111111';
const ADMIN = '22222222-2222-4222-8222-222222222222';

function row(version: number, rules = defaultShopRules): ShopRulesEntity {
  return Object.assign(new ShopRulesEntity(), {
    shopId: SHOP,
    rules,
    version,
    updatedBy: ADMIN,
    createdAt: new Date('2026-01-01T00:00:00Z'),
    updatedAt: new Date('2026-01-02T00:00:00Z'),
  });
}

describe('ShopRulesService', () => {
  let service: ShopRulesService;
  const repo = { findOneBy: jest.fn(), insert: jest.fn(), update: jest.fn() };

  beforeEach(async () => {
    jest.resetAllMocks();
    const moduleRef = await Test.createTestingModule({
      providers: [ShopRulesService, { provide: getRepositoryToken(ShopRulesEntity), useValue: repo }],
    }).compile();
    service = moduleRef.get(ShopRulesService);
  });

  it('answers the defaults at version 0 for a shop without saved rules', async () => {
    repo.findOneBy.mockResolvedValue(null);
    await expect(service.get(SHOP)).resolves.toMatchObject({ rules: defaultShopRules, version: 0, updatedAt: null });
    expect(repo.findOneBy).toHaveBeenCalledWith({ shopId: SHOP });
  });

  it('fills rules added since a row was saved with their defaults', async () => {
    const { supportSpacingIn: _dropped, ...older } = { ...defaultShopRules, slackMinIn: 2 };
    repo.findOneBy.mockResolvedValue(row(3, older as typeof defaultShopRules));
    const rules = await service.rulesOf(SHOP);
    expect(rules).toEqual(shopRulesSchema.parse({ slackMinIn: 2 }));
    expect(rules.supportSpacingIn).toBe(18);
  });

  it('reads a row saved before the spacing table: a uniform spacing the shop chose fills the table, new slack rules default', async () => {
    // Stored as it was before the table (FAA AC 43.13-1B Table 9-3) and the same-mount slack existed.
    repo.findOneBy.mockResolvedValue(row(5, { supportSpacingIn: 24, slackMinIn: 2, slackPercent: 4 } as unknown as typeof defaultShopRules));
    const rules = await service.rulesOf(SHOP);
    expect(rules.supportSpacingByDashIn['6']).toBe(24);
    expect(rules.supportSpacingByDashIn['16']).toBe(24);
    expect(rules.slackMinSameMountIn).toBe(0.5); // common practice default
    repo.findOneBy.mockResolvedValue(row(6, { supportSpacingIn: 18 } as unknown as typeof defaultShopRules));
    expect((await service.rulesOf(SHOP)).supportSpacingByDashIn).toEqual(defaultShopRules.supportSpacingByDashIn);
  });

  it('inserts the first save at version 0 and updates later saves with a version guard', async () => {
    const rules = { ...defaultShopRules, supportSpacingIn: 12 };
    repo.findOneBy.mockResolvedValueOnce(null).mockResolvedValueOnce(row(1, rules));
    await expect(service.put(SHOP, ADMIN, { version: 0, rules })).resolves.toMatchObject({ version: 1 });
    expect(repo.insert).toHaveBeenCalledWith({ shopId: SHOP, rules, updatedBy: ADMIN, version: 1 });

    repo.findOneBy.mockResolvedValueOnce(row(1, rules)).mockResolvedValueOnce(row(2, rules));
    repo.update.mockResolvedValue({ affected: 1 });
    await service.put(SHOP, ADMIN, { version: 1, rules });
    expect(repo.update).toHaveBeenCalledWith({ shopId: SHOP, version: 1 }, { rules, updatedBy: ADMIN });
  });

  it('answers 409 with the current rules on a stale version or a lost race', async () => {
    repo.findOneBy.mockResolvedValue(row(4));
    const stale = service.put(SHOP, ADMIN, { version: 3, rules: defaultShopRules });
    await expect(stale).rejects.toBeInstanceOf(ConflictError);
    await expect(stale).rejects.toMatchObject({ extra: { current: { version: 4 } } });
    expect(repo.update).not.toHaveBeenCalled();

    repo.findOneBy.mockResolvedValueOnce(null).mockResolvedValue(row(1));
    repo.insert.mockRejectedValue(Object.assign(new Error('duplicate key'), { driverError: { code: '23505' } }));
    await expect(service.put(SHOP, ADMIN, { version: 0, rules: defaultShopRules })).rejects.toMatchObject({
      statusCode: 409,
      extra: { current: { version: 1 } },
    });
  });
});
