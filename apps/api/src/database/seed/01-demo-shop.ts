import { ShopEntity } from '../../shops/shop.entity.js';
import { DEMO_SHOP } from './demo-data.js';
import type { SeedStep } from './seed-context.js';

/** Upserts the demo shop by its slug. */
export const seedDemoShop: SeedStep = {
  name: 'demo shop',
  async run(context) {
    const shops = context.manager.getRepository(ShopEntity);
    const existing = await shops.findOneBy({ slug: DEMO_SHOP.slug });
    const shop = await shops.save(shops.merge(existing ?? shops.create(), DEMO_SHOP));
    context.demoShop = shop;
    context.log(`${existing ? 'updated' : 'created'} shop "${shop.name}"`);
  },
};
