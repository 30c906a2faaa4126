import { Test } from '@nestjs/testing';
import { getDataSourceToken, getRepositoryToken } from '@nestjs/typeorm';
import { pngBytes } from '../../test/support/image-bytes.js';
import { BuildsService } from '../builds/builds.service.js';
import { ConflictError, ValidationError } from '../common/errors/app-error.js';
import { StorageService } from '../storage/storage.service.js';
import { UploadEntity } from './upload.entity.js';
import { UploadsService } from './uploads.service.js';

const SHOP = '11111111-1111-4111-8111-111111111111';
const BUILD = '22222222-2222-4222-8222-222222222222';
const USER = '33333333-3333-4333-8333-333333333333';

describe('UploadsService', () => {
  let service: UploadsService;
  const repo = { create: jest.fn(), save: jest.fn(), findOneBy: jest.fn(), delete: jest.fn(), find: jest.fn() };
  const storage = { put: jest.fn(), get: jest.fn(), delete: jest.fn() };
  const lockedRow = { setLock: jest.fn(), getOne: jest.fn() };
  const rowQuery = {
    select: () => rowQuery,
    where: () => rowQuery,
    setLock: (mode: string) => (lockedRow.setLock(mode), rowQuery),
    getOne: () => lockedRow.getOne(),
  };
  const query = jest.fn();
  const dataSource = {
    query,
    // The delete's transaction: its queries and repository calls reach the same mocks.
    transaction: async (work: (tx: unknown) => Promise<unknown>): Promise<unknown> =>
      work({ query, getRepository: () => ({ createQueryBuilder: () => rowQuery, delete: repo.delete }) }),
  };
  const builds = { getOwn: jest.fn() };

  beforeEach(async () => {
    jest.resetAllMocks();
    repo.create.mockImplementation((fields: Partial<UploadEntity>) => Object.assign(new UploadEntity(), fields));
    builds.getOwn.mockResolvedValue({ id: BUILD });
    storage.delete.mockResolvedValue(undefined);
    const moduleRef = await Test.createTestingModule({
      providers: [
        UploadsService,
        { provide: getRepositoryToken(UploadEntity), useValue: repo },
        { provide: getDataSourceToken(), useValue: dataSource },
        { provide: StorageService, useValue: storage },
        { provide: BuildsService, useValue: builds },
      ],
    }).compile();
    service = moduleRef.get(UploadsService);
  });

  const file = (buffer: Buffer, originalname = 'p.png', mimetype = 'image/png') => ({ buffer, originalname, mimetype, size: buffer.length });

  it('stores under a uuid key of the shop and records the sniffed facts', async () => {
    repo.save.mockImplementation(async (row: UploadEntity) => Object.assign(row, { id: 'u1', createdAt: new Date() }));
    const bytes = pngBytes(4, 3);
    const dto = await service.addPhoto(SHOP, USER, BUILD, file(bytes, 'x/../a.png'));
    const [key, body, type] = storage.put.mock.calls[0];
    expect(key).toMatch(new RegExp(`^${SHOP}/[0-9a-f-]{36}$`));
    expect(body).toBe(bytes);
    expect(type).toBe('image/png');
    expect(repo.save.mock.calls[0][0]).toMatchObject({ storageKey: key, fileName: 'a.png', widthPx: 4, heightPx: 3, uploadedById: USER });
    expect(dto).toMatchObject({ id: 'u1', mimeType: 'image/png', sizeBytes: bytes.length });
  });

  it('refuses an empty or missing file before storing anything', async () => {
    await expect(service.addPhoto(SHOP, USER, BUILD, file(Buffer.alloc(0)))).rejects.toBeInstanceOf(ValidationError);
    await expect(service.addPhoto(SHOP, USER, BUILD, undefined)).rejects.toBeInstanceOf(ValidationError);
    expect(storage.put).not.toHaveBeenCalled();
  });

  it('removes the stored bytes again when the record cannot be written', async () => {
    repo.save.mockRejectedValue(new Error('database down'));
    await expect(service.addPhoto(SHOP, USER, BUILD, file(pngBytes(2, 2)))).rejects.toThrow('database down');
    expect(storage.delete).toHaveBeenCalledWith(storage.put.mock.calls[0][0]);
  });

  it('will not delete a photo a circuit sketch uses; otherwise deletes the record, then the bytes', async () => {
    repo.findOneBy.mockResolvedValue(Object.assign(new UploadEntity(), { id: 'u1', shopId: SHOP, storageKey: `${SHOP}/k` }));
    lockedRow.getOne.mockResolvedValue({ id: 'u1' });
    dataSource.query.mockResolvedValueOnce([{ name: 'Fuel' }]);
    await expect(service.remove(SHOP, 'u1')).rejects.toBeInstanceOf(ConflictError);
    expect(repo.delete).not.toHaveBeenCalled();

    dataSource.query.mockResolvedValueOnce([]);
    await service.remove(SHOP, 'u1');
    expect(repo.delete).toHaveBeenCalledWith({ id: 'u1', shopId: SHOP });
    expect(storage.delete).toHaveBeenCalledWith(`${SHOP}/k`);
    // Checked and deleted under a row lock, so a draft save naming the photo cannot slip in between.
    expect(lockedRow.setLock).toHaveBeenCalledWith('pessimistic_write');
  });
});
