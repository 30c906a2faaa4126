import Module from 'node:module';

/**
 * Runs once before the e2e files: applies pending migrations to the test database.
 *
 * Jest loads this file with Node's own `require` (no moduleNameMapper), so the `.js` suffixes of our
 * ESM-style relative imports are retried as `.ts` here, as the mapper does inside the tests.
 */
export default async function globalSetup(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('The e2e tests need DATABASE_URL (a throwaway test database, never the dev one).');

  type Resolve = (request: string, ...rest: unknown[]) => string;
  const moduleWithResolver = Module as unknown as { _resolveFilename: Resolve };
  const original = moduleWithResolver._resolveFilename;
  moduleWithResolver._resolveFilename = function (request, ...rest) {
    try {
      return original.call(this, request, ...rest);
    } catch (error) {
      if (request.startsWith('.') && request.endsWith('.js')) {
        return original.call(this, `${request.slice(0, -3)}.ts`, ...rest);
      }
      throw error;
    }
  };
  try {
    const { migrateDatabase } = await import('../src/database/run-migrations.js');
    await migrateDatabase(url);
  } finally {
    moduleWithResolver._resolveFilename = original;
  }
}
