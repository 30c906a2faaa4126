import { partSchema } from '@linesmith/catalog';
import { circuitDocumentSchema, defaultShopRules, evaluateCircuit, shopRulesSchema } from '@linesmith/routing';
import { coolerLineDocument } from './support/approved-circuit.js';
import { demoIdLookup, seedCatalogueInto } from './support/demo-catalogue.js';
import { bearer, createTestShop, removeShops, tokenFor, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

describe('shop rules and rules evaluation (e2e)', () => {
  let testApp: TestApp;
  let shop: TestShop;
  let rulesShop: TestShop;
  let ids: Map<string, string>;
  let fabToken: string;
  let adminToken: string;
  let rulesFabToken: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    shop = await createTestShop(testApp, 'rules');
    rulesShop = await createTestShop(testApp, 'shop-rules');
    ids = await seedCatalogueInto(testApp, shop.shop);
    fabToken = await tokenFor(testApp, shop, ['fabricator']);
    adminToken = await tokenFor(testApp, rulesShop, ['admin']);
    rulesFabToken = await tokenFor(testApp, rulesShop, ['fabricator', 'parts-clerk']);
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop, rulesShop]);
    await testApp.close();
  });

  const as = bearer;
  const id = demoIdLookup(() => ids);

  describe('shop rules', () => {
    it('answers the defaults with their origins until the admin saves', async () => {
      const response = await testApp.http().get('/api/shop-rules').set(as(rulesFabToken)).expect(200);
      expect(response.body).toMatchObject({ rules: defaultShopRules, defaults: defaultShopRules, version: 0, updatedAt: null });
      // Common practice defaults of DOMAIN §4: a clamp every 18 in, 1-1/2 in and 4 % slack.
      expect(response.body.rules).toMatchObject({ supportSpacingIn: 18, slackMinIn: 1.5, slackPercent: 4 });
      expect(response.body.origins.slackPercent).toMatch(/AC 43\.13-1B/);
    });

    it('lets only the admin save, against the version, with 409 and the current rules when stale', async () => {
      const rules = { ...defaultShopRules, supportSpacingIn: 16 };
      await testApp.http().put('/api/shop-rules').set(as(rulesFabToken)).send({ version: 0, rules }).expect(403);

      const saved = await testApp.http().put('/api/shop-rules').set(as(adminToken)).send({ version: 0, rules }).expect(200);
      expect(saved.body).toMatchObject({ version: 1, rules: { supportSpacingIn: 16 }, updatedAt: expect.stringMatching(/^\d{4}-/) });

      const stale = await testApp
        .http()
        .put('/api/shop-rules')
        .set(as(adminToken))
        .send({ version: 0, rules: { ...rules, supportSpacingIn: 12 } })
        .expect(409);
      expect(stale.body).toMatchObject({ code: 'conflict', current: { version: 1, rules: { supportSpacingIn: 16 } } });

      // Keys left out take their defaults.
      const second = await testApp.http().put('/api/shop-rules').set(as(adminToken)).send({ version: 1, rules: { slackMinIn: 2 } }).expect(200);
      expect(second.body).toMatchObject({ version: 2, rules: { slackMinIn: 2, supportSpacingIn: 18 } });
      const read = await testApp.http().get('/api/shop-rules').set(as(rulesFabToken)).expect(200);
      expect(read.body.rules).toEqual(shopRulesSchema.parse({ slackMinIn: 2 }));

      // The other shop still runs on the defaults.
      expect((await testApp.http().get('/api/shop-rules').set(as(fabToken)).expect(200)).body.version).toBe(0);
    });

    it('answers 400 with the path of a nonsense rule', async () => {
      const response = await testApp
        .http()
        .put('/api/shop-rules')
        .set(as(adminToken))
        .send({ version: 2, rules: { supportSpacingIn: -3, heatClearanceIn: { exhaust: 'far' } } })
        .expect(400);
      expect(response.body.issues.map((issue: { path: string }) => issue.path).sort()).toEqual(
        ['rules.heatClearanceIn.exhaust', 'rules.supportSpacingIn'].sort(),
      );
    });
  });

  describe('POST /api/rules/evaluate', () => {
    /** The shared -6 cooler line (support/approved-circuit.ts), no supports. */
    const coolerLine = () => coolerLineDocument(id);

    const evaluate = (doc: object) => testApp.http().post('/api/rules/evaluate').set(as(fabToken)).send(doc);

    it('answers the cut length and flags that evaluateCircuit gives for the same catalogue and rules', async () => {
      const response = await evaluate(coolerLine()).expect(200);
      const [line] = response.body.lines;

      // Worked by hand (DOMAIN §4): 30 in port to port − (0.95 adapter + 0.80 hose end)
      // − (1.05 adapter + 0.80 hose end) + slack max(1.5 in, 4 % × 30 in = 1.2 in) = 27.90 in,
      // rounded up to the next 1/8 in (common practice: cut long) = 28 in; RMA IP-2 Table 4-8
      // gives ±1/4 in for 24–36 in.
      expect(line.exactCutIn).toBeCloseTo(27.9, 9);
      expect(line.cutLengthIn).toBe(28);
      expect(line.toleranceIn).toBe(0.25);
      expect(line.slackIn).toBe(1.5);

      // The same document evaluated directly by the library with the shop's catalogue and rules.
      const catalogue = await testApp.http().get('/api/parts?pageSize=200&includeRetired=true').set(as(fabToken)).expect(200);
      const parts = catalogue.body.items.map((part: unknown) => partSchema.parse(part));
      const direct = evaluateCircuit(circuitDocumentSchema.parse(coolerLine()), parts, defaultShopRules);
      expect(line.cutLengthIn).toBe(direct.lines[0].cutLengthIn);
      expect(response.body.flags).toEqual(direct.flags);
      expect(response.body.bom).toEqual(direct.bom);

      // One 30 in span between the two ports is longer than the 18 in clamp spacing (common practice).
      expect(response.body.flags).toContainEqual(expect.objectContaining({ code: 'support-gap', severity: 'caution' }));
      expect(response.body.flags.filter((flag: { severity: string }) => flag.severity === 'blocker')).toEqual([]);
      // The -6 O-ring boss port needs its AS568-906 O-ring in the bill of materials.
      expect(response.body.bom.rows).toContainEqual(expect.objectContaining({ partId: id('demo-oring-906'), kind: 'seal' }));
    });

    it("treats another shop's part ids as unknown parts", async () => {
      const response = await testApp.http().post('/api/rules/evaluate').set(as(rulesFabToken)).send(coolerLine()).expect(200);
      expect(response.body.flags.some((flag: { severity: string }) => flag.severity === 'blocker')).toBe(true);
      expect(response.body.lines[0].endStackFromIn).toBe(0);
    });

    it('answers 400 with the path of each problem in an invalid document', async () => {
      const doc = coolerLine();
      doc.lines[0].to = { unitId: 'cooler', portId: 'nowhere' };
      const broken = await evaluate(doc).expect(400);
      expect(broken.body.code).toBe('validation_failed');
      expect(broken.body.issues.map((issue: { path: string }) => issue.path)).toContain('lines.0.to.portId');

      const wrongVersion = await evaluate({ ...coolerLine(), schema: 'linesmith.circuit/0', circuit: { fluid: 'lava' } }).expect(400);
      expect(wrongVersion.body.issues.map((issue: { path: string }) => issue.path)).toEqual(
        expect.arrayContaining(['schema', 'circuit.fluid']),
      );
    });

    it('refuses a circuit over the work budget with 400 circuit_too_complex naming the count and the limit', async () => {
      // 200 corners on each line among 200 heat zones of 200 points: within every schema limit.
      const doc = coolerLine();
      const corners = Array.from({ length: 200 }, (_, k) => ({ x: (k * 37) % 2000, y: (k * 53) % 800, bendRadiusIn: 3 }));
      doc.lines = doc.lines.map((line) => ({ ...line, points: corners }));
      doc.heatZones = Array.from({ length: 200 }, (_, z) => ({
        id: `z${z}`,
        kind: 'exhaust' as const,
        polygon: Array.from({ length: 200 }, (_, k) => ({ x: ((z * 97) % 2000) + 60 * Math.cos((2 * Math.PI * k) / 200), y: ((z * 41) % 800) + 60 * Math.sin((2 * Math.PI * k) / 200) })),
      }));
      const refused = await evaluate(doc).expect(400);
      expect(refused.body.code).toBe('circuit_too_complex');
      expect(refused.body.message).toMatch(/^This circuit is too complex to check: [\d,]+( or more)? corner-zone pairs, the limit is [\d,]+\./);
    });
  });
});
