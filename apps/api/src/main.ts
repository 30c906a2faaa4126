import 'reflect-metadata';
import { createApp } from './bootstrap.js';
import { ConfigValidationError, parseAppConfig } from './config/app-config.schema.js';

async function main(): Promise<void> {
  // Fail fast, before Nest starts, with one line per bad variable.
  const config = parseAppConfig(process.env);
  const app = await createApp();
  app.enableShutdownHooks();
  await app.listen(config.PORT, config.HOST);
}

main().catch((error: unknown) => {
  if (error instanceof ConfigValidationError) {
    console.error(error.message);
  } else {
    console.error('Linesmith API failed to start:', error);
  }
  process.exit(1);
});
