import type { UserEntity } from '../src/users/user.entity.js';
import { createTestShop, removeShops, signIn, TEST_PASSWORD, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

describe('users (e2e)', () => {
  let testApp: TestApp;
  let shopA: TestShop;
  let shopB: TestShop;
  let adminA: UserEntity;
  let fabricatorA: UserEntity;
  let adminB: UserEntity;
  let adminAToken: string;
  let adminBToken: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    shopA = await createTestShop(testApp, 'users-a');
    shopB = await createTestShop(testApp, 'users-b');
    adminA = await shopA.addUser(['admin'], 'admin');
    fabricatorA = await shopA.addUser(['fabricator'], 'fab');
    adminB = await shopB.addUser(['admin', 'reviewer'], 'admin');
    adminAToken = (await signIn(testApp, adminA.email)).accessToken;
    adminBToken = (await signIn(testApp, adminB.email)).accessToken;
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shopA, shopB]);
    await testApp.close();
  });

  const asAdminA = () => ({ Authorization: `Bearer ${adminAToken}` });

  it('lists only the caller shop users, with filters and paging', async () => {
    const all = await testApp.http().get('/api/users').set(asAdminA()).expect(200);
    expect(all.body).toMatchObject({ total: 2, page: 1, pageSize: 50 });
    expect(all.body.items.map((user: { id: string }) => user.id).sort()).toEqual([adminA.id, fabricatorA.id].sort());
    expect(all.body.items[0]).not.toHaveProperty('passwordHash');

    const fabs = await testApp.http().get('/api/users?role=fabricator').set(asAdminA()).expect(200);
    expect(fabs.body.items.map((user: { id: string }) => user.id)).toEqual([fabricatorA.id]);

    const search = await testApp.http().get(`/api/users?search=${encodeURIComponent('FAB of')}`).set(asAdminA()).expect(200);
    expect(search.body.total).toBe(1);

    const paged = await testApp.http().get('/api/users?page=2&pageSize=1&active=true').set(asAdminA()).expect(200);
    expect(paged.body).toMatchObject({ total: 2, page: 2, pageSize: 1 });
    expect(paged.body.items).toHaveLength(1);
  });

  it('creates a user (201), who can then sign in; a taken e-mail answers 409 conflict', async () => {
    const email = `clerk.${shopA.shop.slug}@parts.example`;
    const created = await testApp
      .http()
      .post('/api/users')
      .set(asAdminA())
      .send({ email: email.toUpperCase(), displayName: 'New Clerk', roles: ['parts-clerk'], password: 'a-long-enough-password' })
      .expect(201);
    expect(created.body).toEqual({
      id: expect.any(String),
      email,
      displayName: 'New Clerk',
      roles: ['parts-clerk'],
      active: true,
      version: 1,
      createdAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
      updatedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
    });
    await signIn(testApp, email, 'a-long-enough-password');

    const again = await testApp
      .http()
      .post('/api/users')
      .set(asAdminA())
      .send({ email, displayName: 'Twin', roles: ['fabricator'], password: 'a-long-enough-password' })
      .expect(409);
    expect(again.body.code).toBe('conflict');
  });

  it('answers 400 validation_failed with the path of each bad field', async () => {
    const response = await testApp
      .http()
      .post('/api/users')
      .set(asAdminA())
      .send({ email: 'not-an-email', displayName: '', roles: ['owner'], password: 'short' })
      .expect(400);
    expect(response.body.code).toBe('validation_failed');
    const paths = response.body.issues.map((issue: { path: string }) => issue.path).sort();
    expect(paths).toEqual(['displayName', 'email', 'password', 'roles.0']);

    const query = await testApp.http().get('/api/users?pageSize=0').set(asAdminA()).expect(400);
    expect(query.body.issues).toEqual([{ path: 'pageSize', message: expect.any(String) }]);
  });

  it('patches with optimistic concurrency: a stale version answers 409 with the current user', async () => {
    const renamed = await testApp
      .http()
      .patch(`/api/users/${fabricatorA.id}`)
      .set(asAdminA())
      .send({ version: fabricatorA.version, displayName: 'Rafe the Welder', roles: ['fabricator', 'reviewer'] })
      .expect(200);
    expect(renamed.body).toMatchObject({ displayName: 'Rafe the Welder', roles: ['fabricator', 'reviewer'], version: 2 });

    const stale = await testApp
      .http()
      .patch(`/api/users/${fabricatorA.id}`)
      .set(asAdminA())
      .send({ version: fabricatorA.version, displayName: 'Somebody Else' })
      .expect(409);
    expect(stale.body).toMatchObject({ statusCode: 409, code: 'conflict', issues: [] });
    expect(stale.body.current).toMatchObject({ id: fabricatorA.id, displayName: 'Rafe the Welder', version: 2 });
  });

  it('stops an admin from removing their own admin role or deactivating themselves (400)', async () => {
    const demote = await testApp
      .http()
      .patch(`/api/users/${adminA.id}`)
      .set(asAdminA())
      .send({ version: adminA.version, roles: ['fabricator'] })
      .expect(400);
    expect(demote.body.issues).toEqual([{ path: 'roles', message: expect.any(String) }]);
    const deactivate = await testApp
      .http()
      .patch(`/api/users/${adminA.id}`)
      .set(asAdminA())
      .send({ version: adminA.version, active: false })
      .expect(400);
    expect(deactivate.body.issues).toEqual([{ path: 'active', message: expect.any(String) }]);
  });

  it('gives a fabricator 403 forbidden on /api/users', async () => {
    const { accessToken } = await signIn(testApp, fabricatorA.email, TEST_PASSWORD);
    const response = await testApp.http().get('/api/users').set('Authorization', `Bearer ${accessToken}`).expect(403);
    expect(response.body).toEqual({ statusCode: 403, code: 'forbidden', message: expect.any(String), issues: [] });
  });

  it('keeps shops apart: an admin of shop B patching a user of shop A gets 404', async () => {
    const response = await testApp
      .http()
      .patch(`/api/users/${fabricatorA.id}`)
      .set('Authorization', `Bearer ${adminBToken}`)
      .send({ version: 2, displayName: 'Taken Over' })
      .expect(404);
    expect(response.body.code).toBe('not_found');

    const listB = await testApp.http().get('/api/users').set('Authorization', `Bearer ${adminBToken}`).expect(200);
    expect(listB.body.items.map((user: { id: string }) => user.id)).toEqual([adminB.id]);

    await testApp.http().patch('/api/users/not-a-uuid').set(asAdminA()).send({ version: 1 }).expect(404);
  });
});
