import { RefreshTokenEntity } from '../src/auth/refresh-token.entity.js';
import { hashRefreshToken } from '../src/auth/refresh-tokens.service.js';
import type { UserEntity } from '../src/users/user.entity.js';
import { UsersService } from '../src/users/users.service.js';
import { createTestShop, refreshCookieOf, removeShops, signIn, TEST_PASSWORD, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

function tokenOf(cookie: string): string {
  return decodeURIComponent(cookie.slice('ls_refresh='.length));
}

describe('auth (e2e)', () => {
  let testApp: TestApp;
  let shop: TestShop;
  let fabricator: UserEntity;

  beforeAll(async () => {
    testApp = await startTestApp();
    shop = await createTestShop(testApp, 'auth');
    fabricator = await shop.addUser(['fabricator']);
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop]);
    await testApp.close();
  });

  it('signs in with the right password, sets the refresh cookie and answers Me', async () => {
    const response = await testApp
      .http()
      .post('/api/auth/login')
      .send({ email: fabricator.email.toUpperCase(), password: TEST_PASSWORD })
      .expect(200);

    expect(response.body).toEqual({
      accessToken: expect.any(String),
      expiresInSec: 900,
      user: {
        id: fabricator.id,
        email: fabricator.email,
        displayName: fabricator.displayName,
        roles: ['fabricator'],
        shop: { id: shop.shop.id, name: shop.shop.name },
      },
    });
    const cookieLine = (response.headers['set-cookie'] as unknown as string[]).find((line) => line.startsWith('ls_refresh='));
    expect(cookieLine).toMatch(/HttpOnly/);
    expect(cookieLine).toMatch(/SameSite=Strict/);
    expect(cookieLine).toMatch(/Path=\/api\/auth/);
    expect(cookieLine).not.toMatch(/Secure/);

    const me = await testApp.http().get('/api/me').set('Authorization', `Bearer ${response.body.accessToken}`).expect(200);
    expect(me.body).toEqual(response.body.user);
  });

  it('answers 401 invalid_credentials for a wrong password or an unknown e-mail, alike', async () => {
    const wrongPassword = await testApp
      .http()
      .post('/api/auth/login')
      .send({ email: fabricator.email, password: 'not-the-password' })
      .expect(401);
    const unknownEmail = await testApp
      .http()
      .post('/api/auth/login')
      .send({ email: 'nobody@nowhere.example', password: TEST_PASSWORD })
      .expect(401);
    for (const body of [wrongPassword.body, unknownEmail.body]) {
      expect(body).toEqual({ statusCode: 401, code: 'invalid_credentials', message: expect.any(String), issues: [] });
    }
    expect(wrongPassword.body.message).toBe(unknownEmail.body.message);
  });

  it('refuses a deactivated user at sign-in and at refresh', async () => {
    const leaving = await shop.addUser(['reviewer'], 'leaving');
    const session = await signIn(testApp, leaving.email);
    await testApp.app.get(UsersService).updateUser(shop.shop.id, 'someone-else', leaving.id, {
      version: leaving.version,
      active: false,
    });
    await testApp.http().post('/api/auth/login').send({ email: leaving.email, password: TEST_PASSWORD }).expect(401);
    await testApp.http().post('/api/auth/refresh').set('Cookie', session.cookie).expect(401);
  });

  it('rotates the refresh token, and a reused token revokes the whole family', async () => {
    const session = await signIn(testApp, fabricator.email);

    const first = await testApp.http().post('/api/auth/refresh').set('Cookie', session.cookie).expect(200);
    expect(first.body.accessToken).toEqual(expect.any(String));
    expect(first.body.user.id).toBe(fabricator.id);
    const rotatedCookie = refreshCookieOf(first.headers);
    expect(rotatedCookie).not.toBe(session.cookie);

    // The first cookie was already exchanged: presenting it again is a reuse.
    const reuse = await testApp.http().post('/api/auth/refresh').set('Cookie', session.cookie).expect(401);
    expect(reuse.body.code).toBe('unauthorized');

    // ...which ended the family, so the legitimate successor no longer works either.
    await testApp.http().post('/api/auth/refresh').set('Cookie', rotatedCookie).expect(401);

    const tokens = testApp.dataSource.getRepository(RefreshTokenEntity);
    const firstRow = await tokens.findOneByOrFail({ tokenHash: hashRefreshToken(tokenOf(session.cookie)) });
    const family = await tokens.findBy({ familyId: firstRow.familyId });
    expect(family).toHaveLength(2);
    expect(family.every((row) => row.revokedAt !== null)).toBe(true);
    expect(firstRow.replacedBy).toBe(family.find((row) => row.id !== firstRow.id)?.id);
  });

  it('stores only the sha256 of refresh tokens', async () => {
    const session = await signIn(testApp, fabricator.email);
    const token = tokenOf(session.cookie);
    const stored = await testApp.dataSource.getRepository(RefreshTokenEntity).findBy({ userId: fabricator.id });
    expect(stored.some((row) => row.tokenHash === token)).toBe(false);
    expect(stored.every((row) => /^[0-9a-f]{64}$/.test(row.tokenHash))).toBe(true);
  });

  it('signs out: 204, the cookie is cleared and the token no longer refreshes', async () => {
    const session = await signIn(testApp, fabricator.email);
    const response = await testApp.http().post('/api/auth/logout').set('Cookie', session.cookie).expect(204);
    const cleared = (response.headers['set-cookie'] as unknown as string[]).find((line) => line.startsWith('ls_refresh='));
    expect(cleared).toMatch(/ls_refresh=;/);
    expect(cleared).toMatch(/Expires=Thu, 01 Jan 1970/);
    await testApp.http().post('/api/auth/refresh').set('Cookie', session.cookie).expect(401);
  });

  it('answers 401 unauthorized without a cookie or without a bearer token', async () => {
    const refresh = await testApp.http().post('/api/auth/refresh').expect(401);
    expect(refresh.body.code).toBe('unauthorized');
    const me = await testApp.http().get('/api/me').expect(401);
    expect(me.body).toEqual({ statusCode: 401, code: 'unauthorized', message: expect.any(String), issues: [] });
    await testApp.http().get('/api/me').set('Authorization', 'Bearer not.a.jwt').expect(401);
  });
});
