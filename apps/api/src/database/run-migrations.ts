import { DataSource } from 'typeorm';
import { databaseOptions } from './database-options.js';

/** Applies pending migrations on an open DataSource; running it again applies nothing. */
export async function runPendingMigrations(dataSource: DataSource): Promise<string[]> {
  const applied = await dataSource.runMigrations({ transaction: 'each' });
  return applied.map((migration) => migration.name);
}

/** Opens its own connection: for the CLI scripts and the test setup. */
export async function migrateDatabase(url: string): Promise<string[]> {
  const dataSource = new DataSource(databaseOptions(url));
  await dataSource.initialize();
  try {
    return await runPendingMigrations(dataSource);
  } finally {
    await dataSource.destroy();
  }
}
