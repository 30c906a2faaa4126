import { migrateCircuitDocument } from '@linesmith/routing';
import type { QueryRunner } from 'typeorm';
import { BuildEntity } from '../src/builds/build.entity.js';
import { CircuitEntity } from '../src/circuits/circuit.entity.js';
import { seedDemoShop } from '../src/database/seed/01-demo-shop.js';
import { seedDemoUsers } from '../src/database/seed/02-demo-users.js';
import { seedDemoBuild } from '../src/database/seed/04-demo-build.js';
import type { SeedContext } from '../src/database/seed/seed-context.js';
import { startTestApp, type TestApp } from './support/test-app.js';

describe('demo build seed (e2e, rolled back)', () => {
  let testApp: TestApp;
  let runner: QueryRunner;

  beforeAll(async () => {
    testApp = await startTestApp();
    runner = testApp.dataSource.createQueryRunner();
    await runner.startTransaction();
  });

  afterAll(async () => {
    await runner.rollbackTransaction();
    await runner.release();
    await testApp.close();
  });

  it('creates one pickup build with three valid starter circuits, and a second run changes nothing', async () => {
    const context: SeedContext = { manager: runner.manager, log: () => undefined };
    for (const step of [seedDemoShop, seedDemoUsers, seedDemoBuild, seedDemoBuild]) await step.run(context);
    const shopId = context.demoShop!.id;

    const builds = await runner.manager.getRepository(BuildEntity).findBy({ shopId });
    expect(builds).toHaveLength(1);
    expect(builds[0]).toMatchObject({ vehicleYear: '1974', customerEmail: expect.stringMatching(/\.example$/), status: 'open' });
    expect(builds[0].createdById).not.toBeNull();

    const circuits = await runner.manager
      .getRepository(CircuitEntity)
      .createQueryBuilder('circuit')
      .addSelect('circuit.draft')
      .where('circuit.shop_id = :shopId', { shopId })
      .orderBy('circuit.name')
      .getMany();
    expect(circuits.map((c) => [c.name, c.kind, c.draftVersion, c.version])).toEqual([
      ['Engine-oil cooler', 'engine-oil-cooler', 1, 1],
      ['Fuel return system', 'fuel', 1, 1],
      ['Transmission cooler', 'transmission-cooler', 1, 1],
    ]);
    for (const circuit of circuits) {
      const document = migrateCircuitDocument(circuit.draft);
      expect(document.circuit).toEqual({ fluid: circuit.fluid, maxPressurePsi: circuit.maxPressurePsi, maxTempF: circuit.maxTempF });
      expect(document.units.length).toBeGreaterThanOrEqual(2);
      expect(document.background).toBeNull();
    }
    const transmission = migrateCircuitDocument(circuits[2].draft).units.find((unit) => unit.kind === 'transmission');
    const lubePorts = transmission?.ports.filter((port) => port.feedsLubrication) ?? [];
    expect(lubePorts).toHaveLength(1);
    expect(lubePorts[0]).toMatchObject({ role: 'return', requirement: { feature: 'long-nose' } });
  });
});
