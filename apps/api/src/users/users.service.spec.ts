import { Test } from '@nestjs/testing';
import { getRepositoryToken } from '@nestjs/typeorm';
import { AppError, ConflictError, NotFoundError, ValidationError } from '../common/errors/app-error.js';
import { UserEntity } from './user.entity.js';
import { UsersService } from './users.service.js';

const SHOP = '11111111-1111-4111-8111-111111111111';
const ADMIN_ID = '22222222-2222-4222-8222-222222222222';
const OTHER_ID = '33333333-3333-4333-8333-333333333333';

function userRow(overrides: Partial<UserEntity> = {}): UserEntity {
  return Object.assign(new UserEntity(), {
    id: OTHER_ID,
    shopId: SHOP,
    email: 'fab@shop.example',
    displayName: 'Fab',
    passwordHash: null,
    roles: ['fabricator'],
    active: true,
    version: 3,
    createdAt: new Date('2026-01-02T03:04:05Z'),
    updatedAt: new Date('2026-01-02T03:04:05Z'),
    ...overrides,
  });
}

describe('UsersService', () => {
  let service: UsersService;
  const repo = {
    existsBy: jest.fn(),
    create: jest.fn((fields: Partial<UserEntity>) => Object.assign(new UserEntity(), fields)),
    save: jest.fn(),
    findOneBy: jest.fn(),
    update: jest.fn(),
    findAndCount: jest.fn(),
    // Updates run in a transaction that may also end the user's sessions.
    manager: {
      transaction: (work: (manager: unknown) => Promise<unknown>) => work(txManager),
    },
  };
  const txManager = {
    update: (_entity: unknown, where: unknown, fields: unknown) => repo.update(where, fields),
    query: jest.fn(),
  };

  beforeEach(async () => {
    jest.resetAllMocks();
    repo.create.mockImplementation((fields: Partial<UserEntity>) => Object.assign(new UserEntity(), fields));
    const moduleRef = await Test.createTestingModule({
      providers: [UsersService, { provide: getRepositoryToken(UserEntity), useValue: repo }],
    }).compile();
    service = moduleRef.get(UsersService);
  });

  describe('createUser', () => {
    it('lower-cases the e-mail, hashes the password with argon2id and saves in the caller shop', async () => {
      repo.existsBy.mockResolvedValue(false);
      repo.save.mockImplementation(async (user: UserEntity) => user);
      const user = await service.createUser(SHOP, {
        email: ' New.Clerk@Shop.Example ',
        displayName: 'New Clerk',
        roles: ['parts-clerk'],
        password: 'a-long-password',
      });
      expect(repo.existsBy).toHaveBeenCalledWith({ email: 'new.clerk@shop.example' });
      expect(user).toMatchObject({ shopId: SHOP, email: 'new.clerk@shop.example', roles: ['parts-clerk'], active: true });
      expect(user.passwordHash).toMatch(/^\$argon2id\$/);
    });

    it('creates an invited user without a password', async () => {
      repo.existsBy.mockResolvedValue(false);
      repo.save.mockImplementation(async (user: UserEntity) => user);
      const user = await service.createUser(SHOP, { email: 'invitee@shop.example', displayName: 'I', roles: ['reviewer'] });
      expect(user.passwordHash).toBeNull();
    });

    it('answers 409 conflict when the e-mail exists', async () => {
      repo.existsBy.mockResolvedValue(true);
      const attempt = service.createUser(SHOP, { email: 'fab@shop.example', displayName: 'F', roles: ['fabricator'] });
      await expect(attempt).rejects.toBeInstanceOf(ConflictError);
      expect(repo.save).not.toHaveBeenCalled();
    });

    it('answers 409 when a concurrent insert wins the unique index (PostgreSQL 23505)', async () => {
      repo.existsBy.mockResolvedValue(false);
      repo.save.mockRejectedValue(Object.assign(new Error('duplicate key'), { driverError: { code: '23505' } }));
      const attempt = service.createUser(SHOP, { email: 'fab@shop.example', displayName: 'F', roles: ['fabricator'] });
      await expect(attempt).rejects.toMatchObject({ statusCode: 409, code: 'conflict' });
    });
  });

  describe('updateUser', () => {
    it('updates with a version guard, inside the caller shop', async () => {
      repo.findOneBy
        .mockResolvedValueOnce(userRow())
        .mockResolvedValueOnce(userRow({ displayName: 'Renamed', version: 4 }));
      repo.update.mockResolvedValue({ affected: 1 });
      const user = await service.updateUser(SHOP, ADMIN_ID, OTHER_ID, { version: 3, displayName: 'Renamed' });
      expect(repo.findOneBy).toHaveBeenCalledWith({ id: OTHER_ID, shopId: SHOP });
      expect(repo.update).toHaveBeenCalledWith({ id: OTHER_ID, shopId: SHOP, version: 3 }, { displayName: 'Renamed' });
      // A rename keeps the user signed in.
      expect(txManager.query).not.toHaveBeenCalled();
      expect(user.version).toBe(4);
    });

    it('answers 409 with the current user when the version is stale', async () => {
      repo.findOneBy.mockResolvedValue(userRow({ version: 5, displayName: 'Changed Meanwhile' }));
      const attempt = service.updateUser(SHOP, ADMIN_ID, OTHER_ID, { version: 3, displayName: 'Mine' });
      await expect(attempt).rejects.toBeInstanceOf(ConflictError);
      await expect(attempt).rejects.toMatchObject({
        extra: { current: { id: OTHER_ID, version: 5, displayName: 'Changed Meanwhile' } },
      });
      expect(repo.update).not.toHaveBeenCalled();
    });

    it('answers 409 when another edit lands between the read and the write', async () => {
      repo.findOneBy.mockResolvedValueOnce(userRow()).mockResolvedValueOnce(userRow({ version: 4 }));
      repo.update.mockResolvedValue({ affected: 0 });
      const attempt = service.updateUser(SHOP, ADMIN_ID, OTHER_ID, { version: 3, active: false });
      await expect(attempt).rejects.toMatchObject({ code: 'conflict', extra: { current: { version: 4 } } });
    });

    it('will not let an admin remove their own admin role', async () => {
      repo.findOneBy.mockResolvedValue(userRow({ id: ADMIN_ID, roles: ['admin'] }));
      const attempt = service.updateUser(SHOP, ADMIN_ID, ADMIN_ID, { version: 3, roles: ['fabricator'] });
      await expect(attempt).rejects.toBeInstanceOf(ValidationError);
      await expect(attempt).rejects.toMatchObject({ statusCode: 400, issues: [{ path: 'roles' }] });
      expect(repo.update).not.toHaveBeenCalled();
    });

    it('will not let an admin deactivate themselves, but lets them keep admin and add roles', async () => {
      repo.findOneBy.mockResolvedValue(userRow({ id: ADMIN_ID, roles: ['admin'] }));
      await expect(service.updateUser(SHOP, ADMIN_ID, ADMIN_ID, { version: 3, active: false })).rejects.toMatchObject({
        issues: [{ path: 'active' }],
      });
      repo.update.mockResolvedValue({ affected: 1 });
      await service.updateUser(SHOP, ADMIN_ID, ADMIN_ID, { version: 3, roles: ['admin', 'reviewer'] });
      expect(repo.update).toHaveBeenCalledWith({ id: ADMIN_ID, shopId: SHOP, version: 3 }, { roles: ['admin', 'reviewer'] });
      // A role change ends the user's sessions in the same transaction.
      expect(txManager.query).toHaveBeenCalledWith(expect.stringMatching(/UPDATE refresh_tokens SET revoked_at/), [ADMIN_ID]);
    });

    it('answers 404 for a user of another shop', async () => {
      repo.findOneBy.mockResolvedValue(null);
      const attempt = service.updateUser(SHOP, ADMIN_ID, OTHER_ID, { version: 1, displayName: 'X' });
      await expect(attempt).rejects.toBeInstanceOf(NotFoundError);
      await expect(attempt).rejects.toBeInstanceOf(AppError);
    });
  });

  describe('list', () => {
    it('filters by shop, role, activity and an escaped search, and pages', async () => {
      repo.findAndCount.mockResolvedValue([[userRow()], 7]);
      const page = await service.list(SHOP, { search: '50%_off', role: 'fabricator', active: true, page: 2, pageSize: 5 });
      const options = repo.findAndCount.mock.calls[0][0];
      expect(options.skip).toBe(5);
      expect(options.take).toBe(5);
      expect(options.where).toHaveLength(2);
      for (const where of options.where) {
        expect(where.shopId).toBe(SHOP);
        expect(where.active).toBe(true);
      }
      expect(options.where[0].email.value).toBe('%50\\%\\_off%');
      expect(page).toMatchObject({ total: 7, page: 2, pageSize: 5 });
      expect(page.items[0]).toEqual({
        id: OTHER_ID,
        email: 'fab@shop.example',
        displayName: 'Fab',
        roles: ['fabricator'],
        active: true,
        version: 3,
        createdAt: '2026-01-02T03:04:05.000Z',
        updatedAt: '2026-01-02T03:04:05.000Z',
      });
    });
  });
});
