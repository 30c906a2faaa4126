import { demoParts } from '@linesmith/catalog';
import { circuitDocumentSchema, type CircuitDocument } from '@linesmith/routing';
import { Test } from '@nestjs/testing';
import { getDataSourceToken, getRepositoryToken } from '@nestjs/typeorm';
import { ShopCatalogueService } from '../parts/shop-catalogue.service.js';
import { ShopRulesEntity } from '../shop-rules/shop-rules.entity.js';
import { ShopRulesService } from '../shop-rules/shop-rules.service.js';
import { partIdsOf, RulesService } from './rules.service.js';
import { Engine, InlineEngine } from './engine/engine-pool.service.js';

const SHOP = '11111111-1111-4111-8111-111111111111';

/** A 40 in straight -6 line (10 px/in) from a powertrain ORB port to a chassis 37° port, bare hose ends. */
function line40(): CircuitDocument {
  return circuitDocumentSchema.parse({
    schema: 'linesmith.circuit/1',
    circuit: { fluid: 'atf', maxPressurePsi: 150, maxTempF: 250 },
    calibration: { a: { x: 0, y: 0 }, b: { x: 10, y: 0 }, knownIn: 1 },
    background: null,
    units: [
      { id: 't', kind: 'transmission', x: 0, y: 0, mountGroup: 'powertrain', ports: [{ id: 'p', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'out', dx: 0, dy: 0 }] },
      { id: 'c', kind: 'cooler', x: 400, y: 0, mountGroup: 'chassis', ports: [{ id: 'p', connection: { family: 'flare37', size: '-6', gender: 'male' }, role: 'feed', dx: 0, dy: 0 }] },
    ],
    lines: [
      {
        id: 'L1',
        from: { unitId: 't', portId: 'p' },
        to: { unitId: 'c', portId: 'p' },
        hosePartId: 'demo-hose-6-rubber',
        points: [],
        endStacks: { from: ['demo-adapter-orb6-f37-6', 'demo-hose-end-6-rubber-0'], to: ['demo-hose-end-6-rubber-0'] },
        supports: [{ id: 's', atIn: 20 }],
      },
    ],
    heatZones: [],
  });
}

describe('RulesService', () => {
  let service: RulesService;
  const catalogue = { partsAt: jest.fn() };
  /** The one read of the shop's inputs: tax rate (numeric as text), saved rules as text, catalogue fingerprint. */
  const dataSource = { query: jest.fn() };
  const shopInputs = (taxRatePercent: string, rulesJson: string | null) => [{ taxRatePercent, rulesJson, catalogueFingerprint: '7|7|x' }];

  beforeEach(async () => {
    jest.resetAllMocks();
    catalogue.partsAt.mockResolvedValue(demoParts);
    dataSource.query.mockResolvedValue(shopInputs('0.000', null));
    const moduleRef = await Test.createTestingModule({
      providers: [
        RulesService,
        ShopRulesService,
        { provide: getRepositoryToken(ShopRulesEntity), useValue: {} },
        { provide: ShopCatalogueService, useValue: catalogue },
        { provide: getDataSourceToken(), useValue: dataSource },
        { provide: Engine, useClass: InlineEngine },
      ],
    }).compile();
    service = moduleRef.get(RulesService);
  });

  it('collects every part id a document names', () => {
    const doc = line40();
    doc.units[0].ports[0].plugPartId = 'plug';
    doc.lines[0].sleeves = [{ id: 'sl', startIn: 1, endIn: 2, partId: 'sleeve' }];
    expect([...partIdsOf(doc)].sort()).toEqual(
      ['demo-adapter-orb6-f37-6', 'demo-hose-6-rubber', 'demo-hose-end-6-rubber-0', 'plug', 'sleeve'].sort(),
    );
  });

  it("taxes the bill of materials at the shop profile's rate", async () => {
    dataSource.query.mockResolvedValue(shopInputs('8.250', null));
    const { bom } = await service.evaluate(SHOP, line40());
    expect(dataSource.query).toHaveBeenCalledWith(expect.any(String), [SHOP]);
    expect(bom.subtotalCents).toBeGreaterThan(0);
    // Plain arithmetic: 8.25 % of the subtotal, rounded to the cent.
    expect(bom.taxCents).toBe(Math.round(bom.subtotalCents * 0.0825));
    expect(bom.totalCents).toBe(bom.subtotalCents + bom.taxCents);
  });

  it("evaluates with the caller's catalogue and shop rules", async () => {
    const result = await service.evaluate(SHOP, line40());
    expect(catalogue.partsAt).toHaveBeenCalledWith(SHOP, '7|7|x');
    // 40 − (0.95 + 0.80) − 0.80 + max(1.5, 4 % × 40 = 1.6) = 39.05 → next 1/8 in: 39.125 (DOMAIN §4, common practice).
    expect(result.lines[0].slackIn).toBeCloseTo(1.6, 9);
    expect(result.lines[0].cutLengthIn).toBe(39.125);

    // A shop that wants at least 3 in of slack across mounts: 40 − 2.55 + 3 = 40.45 → 40.5.
    dataSource.query.mockResolvedValue(shopInputs('0.000', JSON.stringify({ slackMinIn: 3 })));
    const roomy = await service.evaluate(SHOP, line40());
    expect(roomy.lines[0].cutLengthIn).toBe(40.5);

    // Changed rules text is parsed afresh (the cache is keyed by the stored text, per shop).
    dataSource.query.mockResolvedValue(shopInputs('0.000', JSON.stringify({ slackMinIn: 1 })));
    const tight = await service.evaluate(SHOP, line40());
    // 40 − 2.55 + max(1, 4 % × 40 = 1.6) = 39.05 → 39.125, as with the defaults.
    expect(tight.lines[0].cutLengthIn).toBe(39.125);
  });

  it('answers not found for a shop that does not exist', async () => {
    dataSource.query.mockResolvedValue([]);
    await expect(service.evaluate(SHOP, line40())).rejects.toThrow(/shop/i);
  });

  it('still finds the clamps and seals the engine picks from the whole catalogue', async () => {
    const result = await service.evaluate(SHOP, line40());
    // The clamp that fits the -6 rubber hose (OD 0.69 in in the 0.63–0.72 in range) and the ORB O-ring are found.
    expect(result.lines[0].clampPartId).toBe('demo-clamp-11-16');
    expect(result.bom.rows.map((row) => row.partId)).toEqual(expect.arrayContaining(['demo-oring-906', 'demo-clamp-11-16']));
    expect(result.flags.find((flag) => flag.code === 'missing-part')).toBeUndefined();
  });
});
