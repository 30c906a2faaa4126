import { Test } from '@nestjs/testing';
import { getDataSourceToken, getRepositoryToken } from '@nestjs/typeorm';
import { circuitKinds, circuitSettingsSchema, type CircuitKind } from '@linesmith/routing';
import { BuildsService } from '../builds/builds.service.js';
import { ConflictError, NotFoundError, ValidationError } from '../common/errors/app-error.js';
import { UploadEntity } from '../uploads/upload.entity.js';
import { CircuitDraftsService } from './circuit-drafts.service.js';
import { CircuitEntity } from './circuit.entity.js';
import { emptyCircuitDocument } from './circuit-document.js';
import { CircuitsService } from './circuits.service.js';

const SHOP = '11111111-1111-4111-8111-111111111111';
const BUILD = '22222222-2222-4222-8222-222222222222';
const CIRCUIT = '33333333-3333-4333-8333-333333333333';

function circuitRow(overrides: Partial<CircuitEntity> = {}): CircuitEntity {
  return Object.assign(new CircuitEntity(), {
    id: CIRCUIT,
    shopId: SHOP,
    buildId: BUILD,
    name: 'Transmission cooler',
    kind: 'transmission-cooler',
    fluid: 'atf',
    maxPressurePsi: 150,
    maxTempF: 250,
    status: 'draft',
    draftVersion: 4,
    version: 2,
    createdAt: new Date('2026-02-01T00:00:00Z'),
    updatedAt: new Date('2026-02-01T00:00:00Z'),
    ...overrides,
  });
}

describe('circuit kind presets', () => {
  it('are valid circuit settings, marked common practice, one per kind', () => {
    for (const [kind, preset] of Object.entries(circuitKinds) as Array<[CircuitKind, (typeof circuitKinds)[CircuitKind]]>) {
      expect(circuitSettingsSchema.safeParse(preset).success).toBe(true);
      expect(preset.origin).toBe('common practice');
      expect(preset.label.length).toBeGreaterThan(0);
      expect(kind).toMatch(/^[a-z-]+$/);
    }
  });
});

describe('CircuitsService', () => {
  let service: CircuitsService;
  const execute = jest.fn();
  const updateBuilder = {
    update: jest.fn(),
    set: jest.fn(),
    where: jest.fn(),
    setParameter: jest.fn(),
    execute,
  };
  const repo = {
    create: jest.fn((fields: Partial<CircuitEntity>) => Object.assign(new CircuitEntity(), fields)),
    save: jest.fn(),
    find: jest.fn(),
    findOneBy: jest.fn(),
    delete: jest.fn(),
    createQueryBuilder: jest.fn(() => updateBuilder),
  };
  const builds = { getOwn: jest.fn() };

  beforeEach(async () => {
    jest.clearAllMocks();
    for (const key of ['update', 'set', 'where', 'setParameter'] as const) updateBuilder[key].mockReturnValue(updateBuilder);
    repo.save.mockImplementation(async (row: CircuitEntity) =>
      Object.assign(row, { id: CIRCUIT, version: 1, createdAt: new Date(), updatedAt: new Date() }),
    );
    const moduleRef = await Test.createTestingModule({
      providers: [
        CircuitsService,
        { provide: getRepositoryToken(CircuitEntity), useValue: repo },
        { provide: BuildsService, useValue: builds },
      ],
    }).compile();
    service = moduleRef.get(CircuitsService);
  });

  it('creates from the kind preset, with an empty draft mirroring the settings', async () => {
    builds.getOwn.mockResolvedValue({ id: BUILD });
    const circuit = await service.create(SHOP, BUILD, { kind: 'power-steering', maxPressurePsi: 1200 });
    const saved = repo.save.mock.calls[0][0] as CircuitEntity;
    const expected = { fluid: circuitKinds['power-steering'].fluid, maxPressurePsi: 1200, maxTempF: circuitKinds['power-steering'].maxTempF };
    expect(saved).toMatchObject({ shopId: SHOP, buildId: BUILD, name: 'Power steering', status: 'draft', draftVersion: 1, ...expected });
    expect(saved.draft).toEqual(emptyCircuitDocument(expected));
    expect(circuit).toMatchObject({ kind: 'power-steering', ...expected });
  });

  it('refuses to create on a build of another shop', async () => {
    builds.getOwn.mockRejectedValue(new NotFoundError('The build'));
    await expect(service.create(SHOP, BUILD, { kind: 'fuel' })).rejects.toBeInstanceOf(NotFoundError);
    expect(repo.save).not.toHaveBeenCalled();
  });

  it('a settings change updates the draft block and the draft version in the same guarded UPDATE', async () => {
    repo.findOneBy.mockResolvedValueOnce(circuitRow()).mockResolvedValueOnce(circuitRow({ fluid: 'engine-oil', version: 3 }));
    execute.mockResolvedValue({ affected: 1 });
    await service.update(SHOP, CIRCUIT, { version: 2, fluid: 'engine-oil' });
    const fields = updateBuilder.set.mock.calls[0][0];
    expect(fields).toMatchObject({ fluid: 'engine-oil', maxPressurePsi: 150, maxTempF: 250 });
    expect(fields.draft()).toContain('jsonb_set');
    expect(fields.draftVersion()).toContain('+ 1');
    expect(updateBuilder.where).toHaveBeenCalledWith(expect.stringContaining('version = :version'), { id: CIRCUIT, shopId: SHOP, version: 2 });
    expect(JSON.parse(updateBuilder.setParameter.mock.calls[0][1])).toEqual({ fluid: 'engine-oil', maxPressurePsi: 150, maxTempF: 250 });
  });

  it('a rename leaves the draft alone; no change writes nothing', async () => {
    repo.findOneBy.mockResolvedValue(circuitRow());
    execute.mockResolvedValue({ affected: 1 });
    await service.update(SHOP, CIRCUIT, { version: 2, name: 'Cooler loop' });
    expect(updateBuilder.set.mock.calls[0][0]).not.toHaveProperty('draft');
    updateBuilder.set.mockClear();
    await service.update(SHOP, CIRCUIT, { version: 2, name: 'Transmission cooler', maxTempF: 250 });
    expect(updateBuilder.set).not.toHaveBeenCalled();
  });

  it('answers 409 with the current circuit for a stale version or a lost race', async () => {
    repo.findOneBy.mockResolvedValue(circuitRow({ version: 5 }));
    await expect(service.update(SHOP, CIRCUIT, { version: 2, name: 'x' })).rejects.toMatchObject({
      code: 'conflict',
      extra: { current: { id: CIRCUIT, version: 5 } },
    });
    repo.findOneBy.mockResolvedValue(circuitRow());
    execute.mockResolvedValue({ affected: 0 });
    await expect(service.update(SHOP, CIRCUIT, { version: 2, name: 'x' })).rejects.toBeInstanceOf(ConflictError);
  });

  it('deletes only drafts: the DELETE itself is limited to status draft', async () => {
    repo.delete.mockResolvedValueOnce({ affected: 1 });
    await service.remove(SHOP, CIRCUIT);
    expect(repo.delete).toHaveBeenCalledWith({ id: CIRCUIT, shopId: SHOP, status: 'draft' });
    repo.delete.mockResolvedValueOnce({ affected: 0 });
    repo.findOneBy.mockResolvedValue(circuitRow({ status: 'in-review' }));
    await expect(service.remove(SHOP, CIRCUIT)).rejects.toThrow(/in-review/);
  });
});

describe('CircuitDraftsService.save', () => {
  let drafts: CircuitDraftsService;
  const circuits = { findOneBy: jest.fn(), createQueryBuilder: jest.fn() };
  /** The photo lookup inside the save's transaction: its filter, its lock and its answer. */
  const photoLookup = { where: jest.fn(), setLock: jest.fn(), getOne: jest.fn() };
  const photoQuery = {
    select: () => photoQuery,
    where: (...args: unknown[]) => (photoLookup.where(...args), photoQuery),
    setLock: (mode: string) => (photoLookup.setLock(mode), photoQuery),
    getOne: () => photoLookup.getOne(),
  };
  const query = jest.fn();
  const dataSource = {
    query,
    transaction: async (work: (tx: unknown) => Promise<unknown>): Promise<unknown> =>
      work({ query, getRepository: (entity: unknown) => (entity === UploadEntity ? { createQueryBuilder: () => photoQuery } : undefined) }),
  };
  const doc = emptyCircuitDocument({ fluid: 'atf', maxPressurePsi: 150, maxTempF: 250 });

  beforeEach(async () => {
    jest.clearAllMocks();
    const moduleRef = await Test.createTestingModule({
      providers: [
        CircuitDraftsService,
        { provide: getRepositoryToken(CircuitEntity), useValue: circuits },
        { provide: getDataSourceToken(), useValue: dataSource },
      ],
    }).compile();
    drafts = moduleRef.get(CircuitDraftsService);
    circuits.findOneBy.mockResolvedValue(circuitRow());
  });

  it('compares and sets in one UPDATE guarded by the expected draft version', async () => {
    dataSource.query.mockResolvedValue([[{ draft_version: 5 }], 1]);
    await expect(drafts.save(SHOP, CIRCUIT, 4, doc)).resolves.toEqual({ draftVersion: 5 });
    const [sql, params] = dataSource.query.mock.calls[0];
    expect(sql).toMatch(/WHERE "id" = \$5 AND "shop_id" = \$6 AND "draft_version" = \$7/);
    expect(params).toEqual([JSON.stringify(doc), 'atf', 150, 250, CIRCUIT, SHOP, 4]);
  });

  it('answers 409 with the current draft when no row matched the version', async () => {
    dataSource.query.mockResolvedValue([[], 0]);
    const current = { ...doc, units: [] };
    circuits.createQueryBuilder.mockReturnValue({
      addSelect: () => ({ where: () => ({ getOne: async () => circuitRow({ draft: current, draftVersion: 6 }) }) }),
    });
    await expect(drafts.save(SHOP, CIRCUIT, 4, doc)).rejects.toMatchObject({
      code: 'conflict',
      extra: { current: { draftVersion: 6, document: current } },
    });
  });

  it('validates the document before touching the database, and checks the background photo', async () => {
    await expect(drafts.save(SHOP, CIRCUIT, 4, { ...doc, units: 'none' })).rejects.toBeInstanceOf(ValidationError);
    expect(dataSource.query).not.toHaveBeenCalled();
    photoLookup.getOne.mockResolvedValue(null);
    const withBackground = { ...doc, background: { uploadId: '44444444-4444-4444-8444-444444444444', opacity: 1, locked: false } };
    await expect(drafts.save(SHOP, CIRCUIT, 4, withBackground)).rejects.toMatchObject({ issues: [{ path: 'background.uploadId' }] });
    expect(photoLookup.where).toHaveBeenCalledWith(expect.any(String), {
      uploadId: withBackground.background.uploadId,
      shopId: SHOP,
      buildId: BUILD,
      kind: 'photo',
    });
    // Share-locked until the draft is written, so a concurrent photo delete waits for this save.
    expect(photoLookup.setLock).toHaveBeenCalledWith('pessimistic_read');
    expect(dataSource.query).not.toHaveBeenCalled();
  });
});
