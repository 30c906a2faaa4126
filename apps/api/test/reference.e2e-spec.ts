import { families as connectionFamilies, familyLabel, type Family } from '@linesmith/catalog';
import { seedCatalogueInto } from './support/demo-catalogue.js';
import { createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

describe('reference (e2e)', () => {
  let testApp: TestApp;
  let shop: TestShop;
  let emptyShop: TestShop;
  let ids: Map<string, string>;
  let token: string;
  let emptyShopToken: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    shop = await createTestShop(testApp, 'reference');
    emptyShop = await createTestShop(testApp, 'reference-empty');
    ids = await seedCatalogueInto(testApp, shop.shop);
    token = (await signIn(testApp, (await shop.addUser(['reviewer'])).email)).accessToken;
    emptyShopToken = (await signIn(testApp, (await emptyShop.addUser(['fabricator'])).email)).accessToken;
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop, emptyShop]);
    await testApp.close();
  });

  const as = (bearer: string) => ({ Authorization: `Bearer ${bearer}` });
  const post = (path: string, body: object, bearer = token) => testApp.http().post(`/api/reference/${path}`).set(as(bearer)).send(body);

  it('asks for a signed-in caller', async () => {
    await testApp.http().get('/api/reference/families').expect(401);
  });

  it('lists the families with labels and the thread tables with their sources', async () => {
    const families = await testApp.http().get('/api/reference/families').set(as(token)).expect(200);
    // Every connection family of the catalogue library, each with its label: the original seven and
    // the BSP, NPTF, NPSM, ORFS, banjo and quick-connect families.
    expect(families.body.map((f: { family: string }) => f.family).sort()).toEqual([...connectionFamilies].sort());
    expect(connectionFamilies).toEqual(
      expect.arrayContaining(['barb', 'flare37', 'flare45', 'invflare45', 'metric', 'npt', 'orb', 'bspp', 'bspt', 'nptf', 'npsm', 'orfs', 'banjo', 'qc']),
    );
    for (const entry of families.body as Array<{ family: Family; label: string }>) expect(entry.label).toBe(familyLabel(entry.family));

    const flare37 = await testApp.http().get('/api/reference/threads?family=flare37').set(as(token)).expect(200);
    expect(flare37.body).toHaveLength(1);
    expect(flare37.body[0].label).toMatch(/37/);
    // SAE J514: -6 is 3/8 in tube with a 9/16-18 UNF thread.
    const dash6 = flare37.body[0].rows.find((row: { size: string }) => row.size === '-6');
    expect(dash6).toMatchObject({ designation: '9/16-18 UNF', tpi: 18, tubeOdIn: 0.375 });
    expect(dash6.source).toMatch(/J514/);
    // ASME B1.1 basic pitch diameter of 9/16-18: 0.5264 in.
    expect(dash6.basicPitchDiameterIn).toBeCloseTo(0.5264, 4);

    // ASME B1.20.1 Table 2, 1/4-18 NPT: E0 = 0.47739 in, L2 = 0.4018 in.
    const npt = await testApp.http().get('/api/reference/threads?family=npt').set(as(token)).expect(200);
    const quarter = npt.body[0].rows.find((row: { size: string }) => row.size === '1/4');
    expect(quarter.e0).toBeCloseTo(0.47739, 4);
    expect(quarter.l2).toBeCloseTo(0.4018, 4);

    const all = await testApp.http().get('/api/reference/threads').set(as(token)).expect(200);
    // One table per family.
    expect(all.body.map((table: { family: string }) => table.family).sort()).toEqual([...connectionFamilies].sort());
    const unknown = await testApp.http().get('/api/reference/threads?family=bsp').set(as(token)).expect(400);
    expect(unknown.body.issues[0].path).toBe('family');
  });

  it('identifies a 9/16-18 reading as -6 37° flare or -6 O-ring boss first', async () => {
    // SAE J514 and SAE J1926-1 both use 9/16-18 UNF at -6; a worn male reads a little under 0.5625 in.
    const response = await post('identify', { odIn: 0.557, tpi: 18, tapered: false }).expect(200);
    const firstTwo = response.body.candidates.slice(0, 2).map((c: { family: string; size: string }) => `${c.family} ${c.size}`);
    expect(firstTwo.sort()).toEqual(['flare37 -6', 'orb -6']);
    expect(response.body.candidates[0].hint).toEqual(expect.any(String));
  });

  it('answers 400 with the path for a nonsense reading', async () => {
    const negative = await post('identify', { odIn: -0.5, tpi: 18 }).expect(400);
    expect(negative.body).toMatchObject({ code: 'validation_failed' });
    expect(negative.body.issues.map((issue: { path: string }) => issue.path)).toContain('odIn');
    const empty = await post('identify', {}).expect(400);
    expect(empty.body.issues).toHaveLength(1);
  });

  it('mates connection specs: a 37° flare male in an O-ring boss port is a seat mismatch', async () => {
    const ok = await post('mate', {
      a: { family: 'flare37', size: '-6', gender: 'male' },
      b: { family: 'flare37', size: '-6', gender: 'female' },
    }).expect(200);
    expect(ok.body).toMatchObject({ ok: true, code: 'ok' });
    // Same 9/16-18 thread, different seats (SAE J514 cone vs SAE J1926-1 O-ring): it leaks.
    const seat = await post('mate', {
      a: { family: 'flare37', size: '-6', gender: 'male' },
      b: { family: 'orb', size: '-6', gender: 'female' },
    }).expect(200);
    expect(seat.body).toMatchObject({ ok: false, code: 'joint-seat' });
    const invalid = await post('mate', { a: { family: 'flare37', size: '-6', gender: 'both' }, b: {} }).expect(400);
    expect(invalid.body.issues.map((issue: { path: string }) => issue.path)).toEqual(
      expect.arrayContaining(['a.gender', 'b.family', 'b.size', 'b.gender']),
    );
  });

  it("joins a cooler's 5/8-18 inverted-flare port to a -6 37° hose end with one demo adapter", async () => {
    // Common practice: a 3/8 in tube inverted-flare port (5/8-18, SAE J512) takes a -6 line, both
    // being 3/8 in tube. The port is the female thread; the adapter's male tube-nut end goes in.
    const body = {
      port: { family: 'invflare45', size: '3/8', gender: 'female' },
      hoseEndSide: { family: 'flare37', size: '-6', gender: 'female' },
    };
    const response = await post('adapters', body).expect(200);
    const [best] = response.body.chains;
    expect(best.partCount).toBe(1);
    expect(best.parts[0]).toMatchObject({ id: ids.get('demo-adapter-invf6-f37-6'), kind: 'adapter', version: 1 });
    expect(best.joints.every((joint: { ok: boolean }) => joint.ok)).toBe(true);

    // Two males never join, and another shop's catalogue is not searched.
    const male = await post('adapters', { ...body, port: { ...body.port, gender: 'male' } }).expect(200);
    expect(male.body.chains).toEqual([]);
    const otherShop = await post('adapters', body, emptyShopToken).expect(200);
    expect(otherShop.body.chains).toEqual([]);
  });

  it('honours a port requirement: the lubrication-feed return port gets the long-nose fitting', async () => {
    const response = await post('adapters', {
      port: { family: 'orb', size: '-6', gender: 'female' },
      hoseEndSide: { family: 'flare37', size: '-6', gender: 'female' },
      requirement: { feature: 'long-nose' },
    }).expect(200);
    expect(response.body.chains.length).toBeGreaterThan(0);
    for (const chain of response.body.chains) expect(chain.parts[0].attributes.features).toContain('long-nose');
    const badMax = await post('adapters', {
      port: { family: 'orb', size: '-6', gender: 'female' },
      hoseEndSide: { family: 'flare37', size: '-6', gender: 'female' },
      maxParts: 99,
    }).expect(400);
    expect(badMax.body.issues[0].path).toBe('maxParts');
  });

  it('lists the rule registry for the Reference page', async () => {
    const response = await testApp.http().get('/api/reference/rules').set(as(token)).expect(200);
    const codes = response.body.map((rule: { code: string }) => rule.code);
    // The flag codes of DOMAIN §5.
    for (const code of ['joint-seat', 'joint-thread', 'joint-gender', 'port-requirement', 'support-gap', 'heat-sleeve', 'scale-missing']) {
      expect(codes).toContain(code);
    }
    for (const rule of response.body) {
      expect(rule).toEqual({ code: expect.any(String), severity: expect.stringMatching(/^(blocker|caution|note)$/), title: expect.any(String), description: expect.any(String) });
    }
  });
});
