import 'reflect-metadata';
import dataSource from './data-source.js';
import { runPendingMigrations } from './run-migrations.js';
import { SEED_STEPS } from './seed/index.js';
import type { SeedContext } from './seed/seed-context.js';

async function main(): Promise<void> {
  await dataSource.initialize();
  try {
    const applied = await runPendingMigrations(dataSource);
    if (applied.length) console.log(`Applied migrations: ${applied.join(', ')}`);
    await dataSource.transaction(async (manager) => {
      const context: SeedContext = { manager, log: (message) => console.log(`  ${message}`) };
      for (const step of SEED_STEPS) {
        console.log(`Seeding ${step.name}`);
        await step.run(context);
      }
    });
    console.log('Seed complete.');
  } finally {
    await dataSource.destroy();
  }
}

main().catch((error: unknown) => {
  console.error('Seed failed:', error instanceof Error ? error.message : error);
  process.exit(1);
});
