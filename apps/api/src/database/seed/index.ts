import { seedDemoShop } from './01-demo-shop.js';
import { seedDemoUsers } from './02-demo-users.js';
import { seedDemoCatalogue } from './03-demo-catalogue.js';
import { seedDemoBuild } from './04-demo-build.js';
import type { SeedStep } from './seed-context.js';

/** Run in this order; each step is idempotent (upserts by natural keys). Append new areas here. */
export const SEED_STEPS: SeedStep[] = [seedDemoShop, seedDemoUsers, seedDemoCatalogue, seedDemoBuild];
