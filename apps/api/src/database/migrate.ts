import 'reflect-metadata';
import dataSource from './data-source.js';
import { runPendingMigrations } from './run-migrations.js';

async function main(): Promise<void> {
  await dataSource.initialize();
  try {
    const applied = await runPendingMigrations(dataSource);
    console.log(applied.length ? `Applied migrations: ${applied.join(', ')}` : 'The database is up to date.');
  } finally {
    await dataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error('Migration failed:', error instanceof Error ? error.message : error);
  process.exit(1);
});
