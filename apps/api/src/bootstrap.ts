import { type INestApplication } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import cookieParser from 'cookie-parser';
import helmet from 'helmet';
import { Logger } from 'nestjs-pino';
import type { Response } from 'express';
import { existsSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { AppModule } from './app.module.js';
import { AppConfigService } from './config/app-config.service.js';
import { AllExceptionsFilter } from './common/errors/all-exceptions.filter.js';
import { ZodValidationPipe } from './common/validation/zod-validation.pipe.js';
import { cspNonce, nonceOf, serveWebApp } from './web-app/serve-web-app.js';

export const API_PREFIX = 'api';

export interface CreateAppOptions {
  /** Environment overrides; tests use them, e.g. `{ LOGIN_RATE_LIMIT: '2' }`. */
  env?: Record<string, string>;
}

/** `<repo>/apps/web/dist`, found from this file whether it runs from src (tests) or dist. */
function defaultWebDistDir(): string {
  const here = typeof __dirname === 'string' ? __dirname : dirname(fileURLToPath(import.meta.url));
  return resolve(here, '../../web/dist');
}

/** Builds the configured, not yet listening app: shared by main.ts and the e2e tests. */
export async function createApp(options: CreateAppOptions = {}): Promise<NestExpressApplication> {
  const webDistDir = options.env?.WEB_DIST_DIR ?? process.env.WEB_DIST_DIR ?? defaultWebDistDir();
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot({ env: options.env }), {
    bufferLogs: true,
    cors: false,
  });
  app.useLogger(app.get(Logger));
  const config = app.get(AppConfigService);
  // Which hops may tell us the client's address and scheme (X-Forwarded-For/-Proto); none by default.
  app.set('trust proxy', config.get('TRUST_PROXY'));
  app.setGlobalPrefix(API_PREFIX);
  // A sketch document of a large circuit (hundreds of lines, thousands of corners) exceeds the
  // 100 kB default; zod still validates every body.
  app.useBodyParser('json', { limit: '5mb' });
  app.use(cspNonce);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Sketch photos are shown from blob: URLs before upload.
          'img-src': ["'self'", 'data:', 'blob:'],
          // Fluent UI inserts its styles at run time: allowed by this response's nonce, not 'unsafe-inline'.
          'style-src': ["'self'", (_request, response) => `'nonce-${nonceOf(response as Response)}'`],
          // A shop may serve Linesmith over plain http on its own network: do not rewrite to https.
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );
  if (existsSync(join(webDistDir, 'index.html'))) app.use(serveWebApp(webDistDir));
  app.use(cookieParser());
  app.useGlobalFilters(new AllExceptionsFilter());
  app.useGlobalPipes(new ZodValidationPipe());
  if (config.get('API_DOCS') === 'on') setUpApiDocs(app);
  return app;
}

function setUpApiDocs(app: INestApplication): void {
  const config = new DocumentBuilder()
    .setTitle('Linesmith API')
    .setDescription('Plan, check and order the fluid lines of custom vehicles.')
    .setVersion('0.1.0')
    .addBearerAuth()
    .build();
  const document = SwaggerModule.createDocument(app, config);
  SwaggerModule.setup(`${API_PREFIX}/docs`, app, document, { jsonDocumentUrl: `${API_PREFIX}/docs-json` });
}
