import { startTestApp, type TestApp } from './support/test-app.js';

describe('platform (e2e)', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('reports health without signing in', async () => {
    const response = await testApp.http().get('/api/health').expect(200);
    expect(response.body).toEqual({ status: 'ok', db: 'up' });
  });

  it('sends the helmet security headers', async () => {
    const response = await testApp.http().get('/api/health');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(response.headers['content-security-policy']).toMatch(/default-src 'self'/);
    expect(response.headers['strict-transport-security']).toMatch(/max-age=/);
    expect(response.headers['x-powered-by']).toBeUndefined();
  });

  it('echoes a sane x-request-id and generates one otherwise', async () => {
    const echoed = await testApp.http().get('/api/health').set('x-request-id', 'trace-abc.123');
    expect(echoed.headers['x-request-id']).toBe('trace-abc.123');
    const generated = await testApp.http().get('/api/health').set('x-request-id', 'bad id with spaces');
    expect(generated.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
  });

  it('lists the routes in /api/docs-json', async () => {
    const response = await testApp.http().get('/api/docs-json').expect(200);
    const paths = Object.keys(response.body.paths as Record<string, unknown>);
    expect(paths).toEqual(
      expect.arrayContaining(['/api/auth/login', '/api/auth/refresh', '/api/auth/logout', '/api/me', '/api/users', '/api/users/{id}', '/api/health']),
    );
  });

  it('answers unknown API routes and malformed JSON in the error shape', async () => {
    const missing = await testApp.http().get('/api/no-such-thing').expect(404);
    expect(missing.body).toEqual({ statusCode: 404, code: 'not_found', message: expect.any(String), issues: [] });
    const malformed = await testApp
      .http()
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('{"email":')
      .expect(400);
    expect(malformed.body).toMatchObject({ statusCode: 400, code: 'bad_request', issues: [] });
  });
});

describe('health when the database is down (e2e)', () => {
  it('answers 503 unavailable', async () => {
    const testApp = await startTestApp();
    try {
      await testApp.dataSource.destroy();
      const response = await testApp.http().get('/api/health').expect(503);
      expect(response.body).toEqual({ statusCode: 503, code: 'unavailable', message: expect.any(String), issues: [] });
    } finally {
      await testApp.close().catch(() => undefined);
    }
  });
});
