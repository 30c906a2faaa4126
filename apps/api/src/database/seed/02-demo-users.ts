import { UserEntity } from '../../users/user.entity.js';
import { hashPassword, verifyPassword } from '../../users/password.js';
import { DEMO_PASSWORD, DEMO_USERS } from './demo-data.js';
import type { SeedStep } from './seed-context.js';

/** Upserts the four demo users by e-mail; the password is re-hashed only when it does not match. */
export const seedDemoUsers: SeedStep = {
  name: 'demo users',
  async run(context) {
    const shop = context.demoShop;
    if (!shop) throw new Error('The demo shop must be seeded before its users.');
    const users = context.manager.getRepository(UserEntity);
    for (const demo of DEMO_USERS) {
      const existing = await users
        .createQueryBuilder('user')
        .addSelect('user.passwordHash')
        .where('lower(user.email) = lower(:email)', { email: demo.email })
        .getOne();
      const passwordOk = existing?.passwordHash ? await verifyPassword(existing.passwordHash, DEMO_PASSWORD) : false;
      const user = users.merge(existing ?? users.create(), {
        ...demo,
        shopId: shop.id,
        active: true,
        passwordHash: passwordOk ? existing!.passwordHash : await hashPassword(DEMO_PASSWORD),
      });
      await users.save(user);
      context.log(`${existing ? 'updated' : 'created'} user ${demo.email}`);
    }
  },
};
