import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { createApp } from '../../src/bootstrap.js';

export interface TestApp {
  app: NestExpressApplication;
  http: () => ReturnType<typeof request>;
  dataSource: DataSource;
  close: () => Promise<void>;
}

/** The real app (same bootstrap as main.ts) on the test database, not listening on a port. */
export async function startTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const app = await createApp({
    env: { LOG_LEVEL: 'silent', LOGIN_RATE_LIMIT: '1000', WEB_DIST_DIR: '/nonexistent', ...env },
  });
  await app.init();
  return {
    app,
    http: () => request(app.getHttpServer()),
    dataSource: app.get(DataSource),
    close: () => app.close(),
  };
}
