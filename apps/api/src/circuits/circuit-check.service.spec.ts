import { demoParts } from '@linesmith/catalog';
import { Test } from '@nestjs/testing';
import { getDataSourceToken, getRepositoryToken } from '@nestjs/typeorm';
import { ShopCatalogueService } from '../parts/shop-catalogue.service.js';
import { RulesService } from '../rules/rules.service.js';
import { ShopRulesEntity } from '../shop-rules/shop-rules.entity.js';
import { ShopRulesService } from '../shop-rules/shop-rules.service.js';
import { CircuitCheckService } from './circuit-check.service.js';
import { Engine, InlineEngine } from '../rules/engine/engine-pool.service.js';

const SHOP = '11111111-1111-4111-8111-111111111111';
const CIRCUIT = '22222222-2222-4222-8222-222222222222';

/** A straight -6 line of `lengthIn` (10 px/in) from a powertrain ORB port to a chassis 37° port, bare hose ends. */
function draftText(lengthIn: number): string {
  return JSON.stringify({
    schema: 'linesmith.circuit/1',
    circuit: { fluid: 'atf', maxPressurePsi: 150, maxTempF: 250 },
    calibration: { a: { x: 0, y: 0 }, b: { x: 10, y: 0 }, knownIn: 1 },
    background: null,
    units: [
      { id: 't', kind: 'transmission', x: 0, y: 0, mountGroup: 'powertrain', ports: [{ id: 'p', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'out', dx: 0, dy: 0 }] },
      { id: 'c', kind: 'cooler', x: lengthIn * 10, y: 0, mountGroup: 'chassis', ports: [{ id: 'p', connection: { family: 'flare37', size: '-6', gender: 'male' }, role: 'feed', dx: 0, dy: 0 }] },
    ],
    lines: [
      {
        id: 'L1',
        from: { unitId: 't', portId: 'p' },
        to: { unitId: 'c', portId: 'p' },
        hosePartId: 'demo-hose-6-rubber',
        points: [],
        endStacks: { from: ['demo-adapter-orb6-f37-6', 'demo-hose-end-6-rubber-0'], to: ['demo-hose-end-6-rubber-0'] },
        supports: [{ id: 's', atIn: lengthIn / 2 }],
      },
    ],
    heatZones: [],
  });
}

describe('CircuitCheckService', () => {
  let service: CircuitCheckService;
  const dataSource = { query: jest.fn() };
  const catalogue = { partsAt: jest.fn() };
  const checkRow = (draftJson: string) => [{ draftJson, taxRatePercent: '0.000', rulesJson: null, catalogueFingerprint: '1|1|x' }];

  beforeEach(async () => {
    jest.resetAllMocks();
    catalogue.partsAt.mockResolvedValue(demoParts);
    const moduleRef = await Test.createTestingModule({
      providers: [
        CircuitCheckService,
        RulesService,
        ShopRulesService,
        { provide: getRepositoryToken(ShopRulesEntity), useValue: {} },
        { provide: ShopCatalogueService, useValue: catalogue },
        { provide: getDataSourceToken(), useValue: dataSource },
        { provide: Engine, useClass: InlineEngine },
      ],
    }).compile();
    service = moduleRef.get(CircuitCheckService);
  });

  it("reads the draft with the shop's inputs in one query scoped to the caller's shop", async () => {
    dataSource.query.mockResolvedValue(checkRow(draftText(40)));
    await service.checkDraft(SHOP, CIRCUIT);
    expect(dataSource.query).toHaveBeenCalledTimes(1);
    expect(dataSource.query).toHaveBeenCalledWith(expect.stringContaining('"shop_id" = $1'), [SHOP, CIRCUIT]);
  });

  it('answers not found when the circuit is not in the shop', async () => {
    dataSource.query.mockResolvedValue([]);
    await expect(service.checkDraft(SHOP, CIRCUIT)).rejects.toThrow(/circuit/i);
  });

  it('checks a repeated draft the same way and a changed draft afresh', async () => {
    // 40 − (0.95 + 0.80) − 0.80 + max(1.5, 4 % × 40 = 1.6) = 39.05 → next 1/8 in: 39.125 (DOMAIN §4, common practice).
    dataSource.query.mockResolvedValue(checkRow(draftText(40)));
    const first = await service.checkDraft(SHOP, CIRCUIT);
    const again = await service.checkDraft(SHOP, CIRCUIT);
    expect(first.lines[0].cutLengthIn).toBe(39.125);
    expect(again).toEqual(first);

    // The same circuit saved 10 in longer by any path: 50 − 2.55 + max(1.5, 2.0) = 49.45 → 49.5.
    dataSource.query.mockResolvedValue(checkRow(draftText(50)));
    const longer = await service.checkDraft(SHOP, CIRCUIT);
    expect(longer.lines[0].cutLengthIn).toBe(49.5);
  });
});
