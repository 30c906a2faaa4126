import type { ShopEntity } from '../../src/shops/shop.entity.js';
import { demoPartIds, seedDemoCatalogue } from '../../src/database/seed/03-demo-catalogue.js';
import type { TestApp } from './test-app.js';

/** Seeds the demo catalogue into a test shop (the real seed step) and returns demo id → database id. */
export async function seedCatalogueInto(testApp: TestApp, shop: ShopEntity): Promise<Map<string, string>> {
  await seedDemoCatalogue.run({ manager: testApp.dataSource.manager, log: () => undefined, demoShop: shop });
  return demoPartIds(testApp.dataSource.manager, shop.id);
}

/**
 * Maps a demo id to its database id, failing loudly for an id that was not seeded; `seeded` is
 * read on each call because specs fill their map in `beforeAll`.
 */
export function demoIdLookup(seeded: () => Map<string, string>): (demoId: string) => string {
  return (demoId) => {
    const found = seeded().get(demoId);
    if (!found) throw new Error(`${demoId} was not seeded`);
    return found;
  };
}
