import { startTestApp, type TestApp } from './support/test-app.js';

describe('login rate limit (e2e)', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp({ LOGIN_RATE_LIMIT: '3' });
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('answers 429 rate_limited after LOGIN_RATE_LIMIT attempts in a minute', async () => {
    const attempt = () =>
      testApp.http().post('/api/auth/login').send({ email: 'nobody@limit.example', password: 'whatever-it-is' });
    for (let i = 0; i < 3; i += 1) {
      const response = await attempt();
      expect(response.status).toBe(401);
    }
    const limited = await attempt();
    expect(limited.status).toBe(429);
    expect(limited.body).toEqual({ statusCode: 429, code: 'rate_limited', message: expect.any(String), issues: [] });
  });

  it('does not limit other routes', async () => {
    for (let i = 0; i < 5; i += 1) await testApp.http().get('/api/health').expect(200);
  });
});
