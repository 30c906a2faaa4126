import { RefreshTokenEntity } from '../src/auth/refresh-token.entity.js';
import { hashRefreshToken, REFRESH_GRACE_MS } from '../src/auth/refresh-tokens.service.js';
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

  /** Moves the moment a refresh token was exchanged back in time (to leave the grace window). */
  const exchangedAgo = async (cookie: string, ms: number) =>
    testApp.dataSource.query(`UPDATE refresh_tokens SET revoked_at = revoked_at - make_interval(secs => $2) WHERE token_hash = $1`, [
      hashRefreshToken(tokenOf(cookie)),
      ms / 1000,
    ]);

  it('rotates the refresh token; reuse after the grace window revokes the whole family', async () => {
    const session = await signIn(testApp, fabricator.email);

    const first = await testApp.http().post('/api/auth/refresh').set('Cookie', session.cookie).expect(200);
    expect(first.body.accessToken).toEqual(expect.any(String));
    expect(first.body.user.id).toBe(fabricator.id);
    const rotatedCookie = refreshCookieOf(first.headers);
    expect(rotatedCookie).not.toBe(session.cookie);

    // 31 s later (REFRESH_GRACE_MS is 30 s) the first cookie is a reuse: a copy leaked.
    await exchangedAgo(session.cookie, REFRESH_GRACE_MS + 1_000);
    const reuse = await testApp.http().post('/api/auth/refresh').set('Cookie', session.cookie).expect(401);
    expect(reuse.body.code).toBe('unauthorized');

    // ...which ended the family, so the legitimate successor and its access token stop working too.
    await testApp.http().post('/api/auth/refresh').set('Cookie', rotatedCookie).expect(401);
    await testApp.http().get('/api/me').set('Authorization', `Bearer ${first.body.accessToken}`).expect(401);

    const tokens = testApp.dataSource.getRepository(RefreshTokenEntity);
    const firstRow = await tokens.findOneByOrFail({ tokenHash: hashRefreshToken(tokenOf(session.cookie)) });
    const family = await tokens.findBy({ familyId: firstRow.familyId });
    expect(family).toHaveLength(2);
    expect(family.every((row) => row.revokedAt !== null)).toBe(true);
    expect(firstRow.replacedBy).toBe(family.find((row) => row.id !== firstRow.id)?.id);
  });

  it('keeps two tabs refreshing at once signed in: both get the same successor', async () => {
    const session = await signIn(testApp, fabricator.email);
    const [a, b] = await Promise.all([
      testApp.http().post('/api/auth/refresh').set('Cookie', session.cookie),
      testApp.http().post('/api/auth/refresh').set('Cookie', session.cookie),
    ]);
    expect([a.status, b.status]).toEqual([200, 200]);
    expect(refreshCookieOf(a.headers)).toBe(refreshCookieOf(b.headers));
    // The shared successor keeps working, and so do both access tokens.
    const next = await testApp.http().post('/api/auth/refresh').set('Cookie', refreshCookieOf(a.headers)).expect(200);
    for (const token of [a.body.accessToken, b.body.accessToken, next.body.accessToken]) {
      await testApp.http().get('/api/me').set('Authorization', `Bearer ${token}`).expect(200);
    }
    // A repeat within the window after the successor itself was exchanged is a reuse (its successor is gone).
    await exchangedAgo(session.cookie, 0);
    await testApp.http().post('/api/auth/refresh').set('Cookie', session.cookie).expect(401);
  });

  it('ends every session at once when a user is deactivated, re-roled or resets the password, and on sign-out', async () => {
    const users = testApp.app.get(UsersService);
    const me = (token: string) => testApp.http().get('/api/me').set('Authorization', `Bearer ${token}`);

    const demoted = await shop.addUser(['admin', 'reviewer'], 'demoted');
    const [one, two] = [await signIn(testApp, demoted.email), await signIn(testApp, demoted.email)];
    await me(one.accessToken).expect(200);
    await users.updateUser(shop.shop.id, 'someone-else', demoted.id, { version: demoted.version, roles: ['reviewer'] });
    for (const session of [one, two]) {
      await me(session.accessToken).expect(401);
      await testApp.http().post('/api/auth/refresh').set('Cookie', session.cookie).expect(401);
    }
    // A fresh sign-in carries the new roles, read from the database.
    const again = await signIn(testApp, demoted.email);
    expect((await me(again.accessToken).expect(200)).body.roles).toEqual(['reviewer']);

    const renamed = await shop.addUser(['fabricator'], 'renamed');
    const kept = await signIn(testApp, renamed.email);
    await users.updateUser(shop.shop.id, 'someone-else', renamed.id, { version: renamed.version, displayName: 'New name' });
    await me(kept.accessToken).expect(200);

    const leaving = await shop.addUser(['parts-clerk'], 'deactivated');
    const leavingSession = await signIn(testApp, leaving.email);
    await users.updateUser(shop.shop.id, 'someone-else', leaving.id, { version: leaving.version, active: false });
    await me(leavingSession.accessToken).expect(401);

    const outgoing = await signIn(testApp, fabricator.email);
    await testApp.http().post('/api/auth/logout').set('Cookie', outgoing.cookie).expect(204);
    await me(outgoing.accessToken).expect(401);
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
