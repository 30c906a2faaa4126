import { circuitDocumentSchema, circuitKinds } from '@linesmith/routing';
import { BuildEntity } from '../../builds/build.entity.js';
import { CircuitEntity } from '../../circuits/circuit.entity.js';
import { UserEntity } from '../../users/user.entity.js';
import { DEMO_BUILD, DEMO_CIRCUITS } from './demo-build-data.js';
import { DEMO_USERS } from './demo-data.js';
import type { SeedStep } from './seed-context.js';

/**
 * The demo pickup and its three circuits, found again by the customer's e-mail and the circuit
 * names. Existing rows are kept as they are (a demo user may have sketched on them); only what is
 * missing is created, so running the seed twice changes nothing.
 */
export const seedDemoBuild: SeedStep = {
  name: 'demo build',
  async run(context) {
    const shop = context.demoShop;
    if (!shop) throw new Error('The demo shop must be seeded before its build.');
    const fabricatorEmail = DEMO_USERS.find((user) => user.roles.includes('fabricator'))?.email;
    const fabricator = fabricatorEmail
      ? await context.manager.getRepository(UserEntity).findOneBy({ shopId: shop.id, email: fabricatorEmail })
      : null;

    const builds = context.manager.getRepository(BuildEntity);
    let build = await builds.findOneBy({ shopId: shop.id, customerEmail: DEMO_BUILD.customerEmail });
    if (build) {
      context.log(`kept build for ${build.customerName}`);
    } else {
      build = await builds.save(builds.create({ ...DEMO_BUILD, shopId: shop.id, createdById: fabricator?.id ?? null }));
      context.log(`created build for ${build.customerName}`);
    }

    const circuits = context.manager.getRepository(CircuitEntity);
    for (const demo of DEMO_CIRCUITS) {
      if (await circuits.existsBy({ shopId: shop.id, buildId: build.id, name: demo.name })) {
        context.log(`kept circuit "${demo.name}"`);
        continue;
      }
      const document = circuitDocumentSchema.parse(demo.document);
      await circuits.save(
        circuits.create({
          shopId: shop.id,
          buildId: build.id,
          name: demo.name,
          kind: demo.kind,
          ...document.circuit,
          status: 'draft',
          draft: document,
          draftVersion: 1,
        }),
      );
      context.log(`created circuit "${demo.name}" (${circuitKinds[demo.kind].label})`);
    }
  },
};
