import { createHmac } from 'node:crypto';
import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { UploadEntity } from '../src/uploads/upload.entity.js';
import { AppConfigService } from '../src/config/app-config.service.js';
import { JWT_AUDIENCE, JWT_ISSUER } from '../src/auth/jwt.strategy.js';
import { createBuild } from './support/builds.js';
import { createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { pngBytes } from './support/image-bytes.js';
import { startTestApp, type TestApp } from './support/test-app.js';

/*
 * The named security checks. Already covered elsewhere and not repeated here:
 * - login rate limit, 429 after LOGIN_RATE_LIMIT attempts: rate-limit.e2e-spec.ts
 * - refresh-token reuse revokes the family (the newest token stops working too): auth.e2e-spec.ts
 * - a deactivated user is refused at sign-in and at refresh: auth.e2e-spec.ts
 * - cross-shop ids answer 404 on every route: access-matrix.e2e-spec.ts
 */

const base64url = (value: Buffer | string) => Buffer.from(value).toString('base64url');

/** A compact JWS (RFC 7515 §7.1) with HS256 (RFC 7518 §3.2), or unsigned with alg "none" (§3.6). */
function jwt(header: Record<string, unknown>, claims: Record<string, unknown>, secret?: string): string {
  const signingInput = `${base64url(JSON.stringify(header))}.${base64url(JSON.stringify(claims))}`;
  const signature = secret ? createHmac('sha256', secret).update(signingInput).digest('base64url') : '';
  return `${signingInput}.${signature}`;
}

describe('security checks (e2e)', () => {
  let storageDir: string;
  let testApp: TestApp;
  let shop: TestShop;
  let fabToken: string;
  let fabClaims: { sub: string; sid: string };
  let secret: string;
  let buildId: string;
  const now = () => Math.floor(Date.now() / 1000);

  beforeAll(async () => {
    storageDir = await mkdtemp(join(tmpdir(), 'linesmith-security-'));
    testApp = await startTestApp({ STORAGE_DRIVER: 'local', STORAGE_DIR: storageDir });
    shop = await createTestShop(testApp, 'security');
    const fab = await shop.addUser(['fabricator']);
    fabToken = (await signIn(testApp, fab.email)).accessToken;
    const signed = JSON.parse(Buffer.from(fabToken.split('.')[1], 'base64url').toString('utf8')) as { sid: string };
    fabClaims = { sub: fab.id, sid: signed.sid };
    secret = testApp.app.get(AppConfigService).get('JWT_SECRET');
    buildId = (await createBuild(testApp, fabToken, { vehicle: { make: 'Redfern' } })).id;
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop]);
    await testApp.close();
    await rm(storageDir, { recursive: true, force: true });
  });

  const me = (token: string) => testApp.http().get('/api/me').set('Authorization', `Bearer ${token}`);

  describe('access tokens', () => {
    it('accepts a token we sign ourselves with the app secret (so the refusals below are about one thing each)', async () => {
      await me(jwt({ alg: 'HS256', typ: 'JWT' }, { ...fabClaims, iss: JWT_ISSUER, aud: JWT_AUDIENCE, iat: now(), exp: now() + 60 }, secret)).expect(200);
    });

    it('refuses a correctly signed token without exp, without a session, or for a made-up user', async () => {
      const base = { iss: JWT_ISSUER, aud: JWT_AUDIENCE, iat: now() };
      await me(jwt({ alg: 'HS256', typ: 'JWT' }, { ...fabClaims, ...base }, secret)).expect(401);
      await me(jwt({ alg: 'HS256' }, { sub: fabClaims.sub, ...base, exp: now() + 60 }, secret)).expect(401);
      // Shop and roles in a token are ignored: an id nobody has, with a live session id, is refused…
      const madeUp = { sub: '00000000-0000-4000-8000-000000000000', sid: fabClaims.sid, shopId: shop.shop.id, roles: ['admin'] };
      const forged = jwt({ alg: 'HS256' }, { ...madeUp, ...base, exp: now() + 60 }, secret);
      await testApp.http().get('/api/users').set('Authorization', `Bearer ${forged}`).expect(401);
      // …and roles claimed in a token do not raise the caller's real ones.
      const claimsAdmin = jwt({ alg: 'HS256' }, { ...fabClaims, roles: ['admin'], ...base, exp: now() + 60 }, secret);
      await testApp.http().get('/api/users').set('Authorization', `Bearer ${claimsAdmin}`).expect(403);
    });

    it('refuses a token whose exp has passed', async () => {
      const expired = jwt({ alg: 'HS256', typ: 'JWT' }, { ...fabClaims, iss: JWT_ISSUER, aud: JWT_AUDIENCE, iat: now() - 120, exp: now() - 60 }, secret);
      const response = await me(expired).expect(401);
      expect(response.body).toEqual({ statusCode: 401, code: 'unauthorized', message: expect.any(String), issues: [] });
    });

    it('refuses a token with alg "none", with or without a signature part', async () => {
      const claims = { ...fabClaims, iss: JWT_ISSUER, aud: JWT_AUDIENCE, iat: now(), exp: now() + 60 };
      const unsigned = jwt({ alg: 'none', typ: 'JWT' }, claims);
      await me(unsigned).expect(401);
      await me(unsigned.slice(0, -1)).expect(401);
      await me(jwt({ alg: 'None' }, claims)).expect(401);
    });

    it('refuses a token signed with another secret, another issuer, audience or algorithm', async () => {
      const claims = { ...fabClaims, iss: JWT_ISSUER, aud: JWT_AUDIENCE, iat: now(), exp: now() + 60 };
      await me(jwt({ alg: 'HS256' }, claims, 'some-other-secret-of-length')).expect(401);
      // The development default earlier versions shipped with is just another secret now.
      await me(jwt({ alg: 'HS256' }, claims, 'linesmith-dev-only-secret-change-me')).expect(401);
      await me(jwt({ alg: 'HS256' }, { ...claims, iss: 'someone-else' }, secret)).expect(401);
      await me(jwt({ alg: 'HS256' }, { ...claims, aud: 'another-api' }, secret)).expect(401);
      const { aud: _aud, ...noAudience } = claims;
      await me(jwt({ alg: 'HS256' }, noAudience, secret)).expect(401);
      const hs512 = `${base64url(JSON.stringify({ alg: 'HS512' }))}.${base64url(JSON.stringify(claims))}`;
      await me(`${hs512}.${createHmac('sha512', secret).update(hs512).digest('base64url')}`).expect(401);
    });
  });

  describe('token lifetime from configuration', () => {
    let shortLived: TestApp;
    let other: TestShop;

    beforeAll(async () => {
      shortLived = await startTestApp({ JWT_ACCESS_TTL_SEC: '1' });
      other = await createTestShop(shortLived, 'security-ttl');
    });

    afterAll(async () => {
      await removeShops(shortLived.dataSource, [other]);
      await shortLived.close();
    });

    it('stops accepting an access token once JWT_ACCESS_TTL_SEC has passed', async () => {
      const token = (await signIn(shortLived, (await other.addUser(['reviewer'])).email)).accessToken;
      await shortLived.http().get('/api/me').set('Authorization', `Bearer ${token}`).expect(200);
      // exp is whole seconds (RFC 7519 §4.1.4): after 2.1 s it has passed for certain.
      await new Promise((resolve) => setTimeout(resolve, 2_100));
      await shortLived.http().get('/api/me').set('Authorization', `Bearer ${token}`).expect(401);
    });
  });

  describe('security headers (helmet)', () => {
    it('sends CSP with frame-ancestors, nosniff, frame options and referrer policy, and no X-Powered-By', async () => {
      for (const path of ['/api/health', '/api/me', '/api/no-such-route']) {
        const response = await testApp.http().get(path);
        const csp = response.headers['content-security-policy'] as string;
        expect(csp).toMatch(/default-src 'self'/);
        expect(csp).toMatch(/frame-ancestors 'self'/);
        expect(csp).toMatch(/object-src 'none'/);
        // Run-time styles by nonce only (a fresh one per response), never 'unsafe-inline'.
        expect(csp).toMatch(/style-src 'self' 'nonce-[A-Za-z0-9+/=]{24}'/);
        expect(csp).not.toMatch(/unsafe-inline/);
        expect(response.headers['x-content-type-options']).toBe('nosniff');
        expect(response.headers['x-frame-options']).toBe('SAMEORIGIN');
        expect(response.headers['referrer-policy']).toBe('no-referrer');
        expect(response.headers['x-powered-by']).toBeUndefined();
      }
    });
  });

  describe('uploaded files', () => {
    const upload = (bytes: Buffer, filename: string, contentType: string) =>
      testApp
        .http()
        .post(`/api/builds/${buildId}/uploads`)
        .set('Authorization', `Bearer ${fabToken}`)
        .attach('file', bytes, { filename, contentType });

    it('refuses a file whose name or type lies about its contents', async () => {
      const pngAsJpeg = await upload(pngBytes(3, 3), 'photo.jpg', 'image/jpeg').expect(400);
      expect(pngAsJpeg.body).toMatchObject({ statusCode: 400, code: expect.any(String), issues: expect.any(Array) });
      const textAsPng = await upload(Buffer.from('#!/bin/sh\necho hello\n'), 'photo.png', 'image/png').expect(400);
      expect(textAsPng.body.message).toMatch(/not a JPEG, PNG or WebP/);
      const htmlAsPng = await upload(Buffer.from('<html><script>alert(1)</script></html>'), 'page.png', 'image/png').expect(400);
      expect(htmlAsPng.body.statusCode).toBe(400);
    });

    it('keeps path parts of a file name out of storage: name sanitised, key chosen by the server, bytes only by id', async () => {
      const bytes = pngBytes(6, 4);
      const created = await upload(bytes, '../../etc/passwd.png', 'image/png').expect(201);
      expect(created.body.fileName).toBe('passwd.png');
      const row = await testApp.dataSource.getRepository(UploadEntity).findOneByOrFail({ id: created.body.id });
      expect(row.storageKey).not.toMatch(/passwd|\.\./);
      // Nothing was written outside the shop's folder of the storage directory.
      expect(await readdir(storageDir)).toEqual([shop.shop.id]);
      expect((await readdir(join(storageDir, shop.shop.id))).every((name) => /^[0-9a-f-]{36}$/.test(name))).toBe(true);

      const content = await testApp
        .http()
        .get(`/api/uploads/${created.body.id}/content`)
        .set('Authorization', `Bearer ${fabToken}`)
        .buffer(true)
        .parse((res, done) => {
          const chunks: Buffer[] = [];
          res.on('data', (chunk: Buffer) => chunks.push(chunk));
          res.on('end', () => done(null, Buffer.concat(chunks)));
        })
        .expect(200);
      expect((content.body as Buffer).equals(bytes)).toBe(true);
      expect(content.headers['content-disposition']).toMatch(/^inline; filename="passwd\.png"/);
    });

    it('never serves a file from disk for traversal in route parameters', async () => {
      const paths = [
        '/api/uploads/..%2F..%2Fetc/content',
        '/api/uploads/..%2F..%2F..%2F..%2Fetc%2Fpasswd/content',
        '/api/uploads/%2e%2e%2f%2e%2e%2fetc%2fpasswd/content',
        '/api/uploads/../../etc/passwd',
        '/api/uploads/..%5C..%5Cwindows%5Cwin.ini/content',
        `/api/builds/..%2F${buildId}/uploads`,
        '/api/circuits/..%2F..%2Fpackage.json/revisions/1',
      ];
      for (const path of paths) {
        const response = await testApp.http().get(path).set('Authorization', `Bearer ${fabToken}`);
        expect([400, 404]).toContain(response.status);
        expect(response.headers['content-type']).toMatch(/^application\/json/);
        expect(JSON.stringify(response.body)).not.toMatch(/root:|\[extensions\]|"name":\s*"@linesmith/);
      }
    });
  });
});
