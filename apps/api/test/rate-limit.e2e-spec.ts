import { randomInt } from 'node:crypto';
import { createTestShop, removeShops, TEST_PASSWORD, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

/** A documentation-prefix address (RFC 3849) of its own per call, so tests and runs never share counters. */
let addressCounter = randomInt(1, 60_000);
const nextAddress = () => {
  addressCounter += 1;
  return `2001:db8::${addressCounter.toString(16)}`;
};

describe('abuse limits (e2e)', () => {
  let behindProxy: TestApp;
  let replica: TestApp;
  let direct: TestApp;
  let shop: TestShop;

  beforeAll(async () => {
    // Two processes of one installation (shared PostgreSQL), both behind a proxy on loopback.
    behindProxy = await startTestApp({ LOGIN_RATE_LIMIT: '3', LOGIN_ACCOUNT_LIMIT: '4', TRUST_PROXY: 'loopback' });
    replica = await startTestApp({ LOGIN_RATE_LIMIT: '3', LOGIN_ACCOUNT_LIMIT: '4', TRUST_PROXY: 'loopback' });
    direct = await startTestApp({ LOGIN_RATE_LIMIT: '3' });
    shop = await createTestShop(behindProxy, 'limits');
  });

  afterAll(async () => {
    await removeShops(behindProxy.dataSource, [shop]);
    await Promise.all([behindProxy.close(), replica.close(), direct.close()]);
  });

  const login = (app: TestApp, from: string | null, email: string, password = 'whatever-it-is') => {
    const request = app.http().post('/api/auth/login');
    if (from) request.set('X-Forwarded-For', from);
    return request.send({ email, password });
  };

  it('answers 429 rate_limited with Retry-After after LOGIN_RATE_LIMIT attempts a minute from one address', async () => {
    const from = nextAddress();
    for (let i = 0; i < 3; i += 1) {
      expect((await login(behindProxy, from, `nobody${i}@limit.example`)).status).toBe(401);
    }
    const limited = await login(behindProxy, from, 'nobody@limit.example');
    expect(limited.status).toBe(429);
    expect(limited.body).toEqual({ statusCode: 429, code: 'rate_limited', message: expect.any(String), issues: [] });
    expect(Number(limited.headers['retry-after'])).toBeGreaterThan(0);
    expect(Number(limited.headers['retry-after'])).toBeLessThanOrEqual(60);
  });

  it('shares one allowance across API processes (the counters live in PostgreSQL)', async () => {
    const from = nextAddress();
    await login(behindProxy, from, 'a@limit.example').expect(401);
    await login(replica, from, 'b@limit.example').expect(401);
    await login(behindProxy, from, 'c@limit.example').expect(401);
    await login(replica, from, 'd@limit.example').expect(429);
  });

  it('locks an account after LOGIN_ACCOUNT_LIMIT failed sign-ins, from whatever addresses, known e-mail or not', async () => {
    const user = await shop.addUser(['fabricator']);
    for (let i = 0; i < 4; i += 1) await login(behindProxy, nextAddress(), user.email, 'wrong-password-here').expect(401);
    // Even the right password from a new address is refused while the account is locked.
    const locked = await login(replica, nextAddress(), user.email, TEST_PASSWORD).expect(429);
    expect(locked.body.message).toMatch(/this account/);
    const unknown = `ghost.${randomInt(1e9)}@limit.example`;
    for (let i = 0; i < 4; i += 1) await login(behindProxy, nextAddress(), unknown).expect(401);
    await login(behindProxy, nextAddress(), unknown).expect(429);
  });

  it('clears the account count on a successful sign-in', async () => {
    const user = await shop.addUser(['reviewer']);
    for (let i = 0; i < 3; i += 1) await login(behindProxy, nextAddress(), user.email, 'wrong-password-here').expect(401);
    await login(behindProxy, nextAddress(), user.email, TEST_PASSWORD).expect(200);
    for (let i = 0; i < 3; i += 1) await login(behindProxy, nextAddress(), user.email, 'wrong-password-here').expect(401);
    await login(behindProxy, nextAddress(), user.email, TEST_PASSWORD).expect(200);
  });

  it('ignores X-Forwarded-For without TRUST_PROXY, so a client cannot buy itself a fresh allowance', async () => {
    await direct.dataSource.query(`DELETE FROM rate_limits WHERE key LIKE 'client:login:%'`);
    for (let i = 0; i < 3; i += 1) await login(direct, nextAddress(), `spoof${i}@limit.example`).expect(401);
    await login(direct, nextAddress(), 'spoof@limit.example').expect(429);
    await direct.dataSource.query(`DELETE FROM rate_limits WHERE key LIKE 'client:login:%'`);
  });

  it('limits the reset request route per address too, and leaves other routes alone', async () => {
    const from = nextAddress();
    for (let i = 0; i < 3; i += 1) {
      await behindProxy.http().post('/api/auth/request-reset').set('X-Forwarded-For', from).send({ email: `r${i}@limit.example` }).expect(202);
    }
    await behindProxy.http().post('/api/auth/request-reset').set('X-Forwarded-For', from).send({ email: 'r@limit.example' }).expect(429);
    for (let i = 0; i < 5; i += 1) await behindProxy.http().get('/api/health').set('X-Forwarded-For', from).expect(200);
  });

});
