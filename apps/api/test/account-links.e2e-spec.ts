import { createServer } from 'node:net';
import { decodeQuotedPrintable, type FakeSmtp } from '../src/mail/fake-smtp-server.js';
import { UserEntity } from '../src/users/user.entity.js';
import { startTestSmtp, tokenFromMail } from './support/fake-smtp.js';
import { createTestShop, removeShops, signIn, TEST_PASSWORD, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

/** A loopback port with nothing listening: bind an ephemeral port, then free it. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as { port: number };
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

describe('invitations, password reset and the outbox (e2e)', () => {
  let smtp: FakeSmtp;
  let testApp: TestApp;
  let shop: TestShop;
  let adminToken: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    smtp = await startTestSmtp();
    testApp = await startTestApp({ SMTP_PORT: String(smtp.port), APP_URL: 'http://app.linesmith.example', RESET_RATE_LIMIT: '2' });
    shop = await createTestShop(testApp, 'links');
    adminToken = (await signIn(testApp, (await shop.addUser(['admin'])).email)).accessToken;
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop]);
    await testApp.close();
    await smtp.close();
  });

  it('invites a user whose e-mailed link sets a password and signs in', async () => {
    const email = `fab.${Date.now()}@${shop.shop.slug}.example`;
    const invited = await testApp
      .http()
      .post('/api/users/invite')
      .set(as(adminToken))
      .send({ email, displayName: 'Fab One', roles: ['fabricator'] })
      .expect(201);
    expect(invited.body).toMatchObject({ email, roles: ['fabricator'], active: true });
    // No password yet: sign-in fails like a wrong password.
    await testApp.http().post('/api/auth/login').send({ email, password: TEST_PASSWORD }).expect(401);

    const mail = smtp.messages().find((message) => message.to.includes(email));
    expect(decodeQuotedPrintable(mail?.raw ?? '')).toContain('http://app.linesmith.example/accept-invite?token');
    const token = tokenFromMail(smtp, email, 'accept-invite');
    const accepted = await testApp.http().post('/api/auth/accept-invite').send({ token, password: 'a-new-password-1' }).expect(200);
    expect(accepted.body).toMatchObject({ user: { email, roles: ['fabricator'] }, expiresInSec: expect.any(Number) });
    expect(accepted.headers['set-cookie']).toEqual(expect.arrayContaining([expect.stringMatching(/^ls_refresh=/)]));
    await testApp.http().post('/api/auth/login').send({ email, password: 'a-new-password-1' }).expect(200);
    // One use only.
    await testApp.http().post('/api/auth/accept-invite').send({ token, password: 'another-password-2' }).expect(400);

    const outbox = await testApp.http().get('/api/outbox').set(as(adminToken)).expect(200);
    expect(outbox.body).toEqual(expect.arrayContaining([expect.objectContaining({ to: email, status: 'sent' })]));
  });

  it('undoes an invitation whose e-mail cannot be sent, and records the failure in the outbox', async () => {
    const down = await startTestApp({ SMTP_PORT: String(await closedPort()) });
    try {
      const token = (await signIn(down, (await shop.addUser(['admin'], 'admin2')).email)).accessToken;
      const email = `nomail.${Date.now()}@${shop.shop.slug}.example`;
      await down.http().post('/api/users/invite').set(as(token)).send({ email, displayName: 'No Mail', roles: ['reviewer'] }).expect(503);
      expect(await down.dataSource.getRepository(UserEntity).existsBy({ email })).toBe(false);
      const outbox = await down.http().get('/api/outbox').set(as(token)).expect(200);
      expect(outbox.body).toEqual(expect.arrayContaining([expect.objectContaining({ to: email, status: 'failed', error: expect.any(String) })]));
    } finally {
      await down.close();
    }
  });

  it('only admins invite, and the outbox is for admins', async () => {
    const fab = await shop.addUser(['fabricator']);
    const fabToken = (await signIn(testApp, fab.email)).accessToken;
    await testApp.http().post('/api/users/invite').set(as(fabToken)).send({ email: 'x@y.example', displayName: 'X', roles: ['fabricator'] }).expect(403);
    await testApp.http().get('/api/outbox').set(as(fabToken)).expect(403);
  });

  it('resets a password through the e-mailed link; unknown addresses get the same 202', async () => {
    const user = await shop.addUser(['reviewer']);
    await testApp.http().post('/api/auth/request-reset').send({ email: 'nobody@nowhere.example' }).expect(202);
    await testApp.http().post('/api/auth/request-reset').send({ email: user.email.toUpperCase() }).expect(202);
    const token = tokenFromMail(smtp, user.email, 'reset-password');
    await testApp.http().post('/api/auth/reset-password').send({ token, password: 'short' }).expect(400);
    await testApp.http().post('/api/auth/reset-password').send({ token, password: 'brand-new-password' }).expect(204);
    await testApp.http().post('/api/auth/login').send({ email: user.email, password: TEST_PASSWORD }).expect(401);
    await testApp.http().post('/api/auth/login').send({ email: user.email, password: 'brand-new-password' }).expect(200);
    await testApp.http().post('/api/auth/reset-password').send({ token, password: 'brand-new-password-2' }).expect(400);
  });

  it('sends at most RESET_RATE_LIMIT reset links per address and hour', async () => {
    const user = await shop.addUser(['reviewer'], 'limited');
    const count = () => smtp.messages().filter((message) => message.to.includes(user.email)).length;
    for (let attempt = 0; attempt < 4; attempt += 1) {
      await testApp.http().post('/api/auth/request-reset').send({ email: user.email }).expect(202);
    }
    expect(count()).toBe(2);
  });
});
