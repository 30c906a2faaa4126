import type { DataSourceOptions } from 'typeorm';
import { ENTITIES } from './entities.js';
import { MIGRATIONS } from './migrations/index.js';

/** One definition for the Nest app, the migrate/seed scripts, the TypeORM CLI and the tests. */
export function databaseOptions(url: string): DataSourceOptions {
  return {
    type: 'postgres',
    url,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'schema_migrations',
    migrationsTransactionMode: 'each',
    synchronize: false,
    migrationsRun: false,
    // gen_random_uuid() is built into PostgreSQL 13+: no extension to install.
    uuidExtension: 'pgcrypto',
    installExtensions: false,
    extra: { max: 10, connectionTimeoutMillis: 5000 },
  };
}
