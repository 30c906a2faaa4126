import type { EntityManager } from 'typeorm';
import type { ShopEntity } from '../../shops/shop.entity.js';

/** Passed from one seed step to the next: later steps (parts, builds) read what earlier ones made. */
export interface SeedContext {
  manager: EntityManager;
  log: (message: string) => void;
  demoShop?: ShopEntity;
}

export interface SeedStep {
  name: string;
  run: (context: SeedContext) => Promise<void>;
}
