import { createBuild, createCircuit } from './support/builds.js';
import type { UserEntity } from '../src/users/user.entity.js';
import { createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

describe('builds (e2e)', () => {
  let testApp: TestApp;
  let shopA: TestShop;
  let shopB: TestShop;
  let fabA: string;
  let fabAUser: UserEntity;
  let reviewerA: string;
  let fabB: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    shopA = await createTestShop(testApp, 'builds-a');
    shopB = await createTestShop(testApp, 'builds-b');
    fabAUser = await shopA.addUser(['fabricator']);
    fabA = (await signIn(testApp, fabAUser.email)).accessToken;
    reviewerA = (await signIn(testApp, (await shopA.addUser(['reviewer'])).email)).accessToken;
    fabB = (await signIn(testApp, (await shopB.addUser(['fabricator'])).email)).accessToken;
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shopA, shopB]);
    await testApp.close();
  });

  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  it('creates a build (201) with trimmed free text; reviewers may read but not create', async () => {
    const build = await createBuild(testApp, fabA, {
      vehicle: { year: ' 1972 ', make: 'Redfern', model: 'Flatbed', engine: 'V8 swap' },
      customer: { name: 'Ottilie Brandvold', email: 'ottilie@farm.example' },
    });
    expect(build).toMatchObject({
      vehicle: { year: '1972', make: 'Redfern', model: 'Flatbed', engine: 'V8 swap', transmission: '' },
      customer: { name: 'Ottilie Brandvold', phone: '', email: 'ottilie@farm.example' },
      status: 'open',
      version: 1,
      circuitCounts: { total: 0, byStatus: { draft: 0, approved: 0 } },
      // The creator by id and by name, so the build page can say who started it.
      createdById: fabAUser.id,
      createdBy: { id: fabAUser.id, displayName: fabAUser.displayName },
    });
    await testApp.http().post('/api/builds').set(as(reviewerA)).send({ vehicle: { make: 'X' } }).expect(403);
    await testApp.http().get(`/api/builds/${build.id}`).set(as(reviewerA)).expect(200);
  });

  it('answers 400 with paths for an empty build or a bad e-mail', async () => {
    const empty = await testApp.http().post('/api/builds').set(as(fabA)).send({}).expect(400);
    expect(empty.body.issues).toEqual([expect.objectContaining({ path: 'vehicle.make' })]);
    const badEmail = await testApp
      .http()
      .post('/api/builds')
      .set(as(fabA))
      .send({ vehicle: { make: 'Redfern' }, customer: { email: 'not-an-address' } })
      .expect(400);
    expect(badEmail.body.issues[0].path).toBe('customer.email');
  });

  it('searches vehicle and customer text word by word, filters by status, sorts and pages', async () => {
    const a = await createBuild(testApp, fabA, { vehicle: { year: '1968', make: 'Kestrel', model: 'Roadster' }, customer: { name: 'Zed Quarry' } });
    const b = await createBuild(testApp, fabA, { vehicle: { year: '1979', make: 'Kestrel', model: 'Crew cab' }, customer: { name: 'Amos Pell', phone: '555-0199' } });
    const c = await createBuild(testApp, fabA, { vehicle: { make: 'Marlow', model: 'Wagon' }, customer: { name: 'mina Ostrander' }, status: 'on-hold' });

    const kestrel = await testApp.http().get('/api/builds?search=kestrel').set(as(fabA)).expect(200);
    expect(kestrel.body.items.map((item: { id: string }) => item.id).sort()).toEqual([a.id, b.id].sort());
    const words = await testApp.http().get(`/api/builds?search=${encodeURIComponent('kestrel 1979')}`).set(as(fabA)).expect(200);
    expect(words.body.items.map((item: { id: string }) => item.id)).toEqual([b.id]);
    const phone = await testApp.http().get('/api/builds?search=0199').set(as(fabA)).expect(200);
    expect(phone.body.total).toBe(1);
    // LIKE wildcards in the search are literal text.
    expect((await testApp.http().get('/api/builds?search=%25').set(as(fabA)).expect(200)).body.total).toBe(0);

    const onHold = await testApp.http().get('/api/builds?status=on-hold').set(as(fabA)).expect(200);
    expect(onHold.body.items.map((item: { id: string }) => item.id)).toEqual([c.id]);
    const either = await testApp.http().get('/api/builds?status=open,on-hold&search=kestrel').set(as(fabA)).expect(200);
    expect(either.body.total).toBe(2);
    await testApp.http().get('/api/builds?status=scrapped').set(as(fabA)).expect(400);

    const byCustomer = await testApp.http().get('/api/builds?sort=customer&search=a').set(as(fabA)).expect(200);
    const names = byCustomer.body.items.map((item: { customer: { name: string } }) => item.customer.name.toLowerCase());
    expect(names).toEqual([...names].sort());
    const newest = await testApp.http().get('/api/builds?sort=createdAt').set(as(fabA)).expect(200);
    expect(newest.body.items[0].id).toBe(c.id);

    const page2 = await testApp.http().get('/api/builds?sort=createdAt&direction=asc&page=2&pageSize=2').set(as(fabA)).expect(200);
    expect(page2.body).toMatchObject({ page: 2, pageSize: 2, total: 4 });
    expect(page2.body.items.map((item: { id: string }) => item.id)).toEqual([b.id, c.id]);
  });

  it('counts circuits by status on list items', async () => {
    const build = await createBuild(testApp, fabA, { vehicle: { make: 'Counted' } });
    const first = await createCircuit(testApp, fabA, build.id, { kind: 'fuel' });
    await createCircuit(testApp, fabA, build.id, { kind: 'coolant' });
    await testApp.dataSource.query(`UPDATE "circuits" SET "status" = 'approved' WHERE "id" = $1`, [first.id]);
    const list = await testApp.http().get('/api/builds?search=counted').set(as(fabA)).expect(200);
    expect(list.body.items[0].circuitCounts).toEqual({
      total: 2,
      byStatus: { draft: 1, 'in-review': 0, returned: 0, approved: 1, ordered: 0, installed: 0 },
    });
    expect(list.body.items[0].createdBy).toEqual({ id: fabAUser.id, displayName: fabAUser.displayName });
    const one = await testApp.http().get(`/api/builds/${build.id}`).set(as(fabA)).expect(200);
    expect(one.body.createdBy).toEqual({ id: fabAUser.id, displayName: fabAUser.displayName });
  });

  it('patches against the version: 200 with the next version, 409 with the current build when stale', async () => {
    const build = await createBuild(testApp, fabA, { vehicle: { make: 'Patchable' }, notes: 'first' });
    const patched = await testApp
      .http()
      .patch(`/api/builds/${build.id}`)
      .set(as(fabA))
      .send({ version: 1, notes: 'second', status: 'done', customer: { phone: '555-0100' } })
      .expect(200);
    expect(patched.body).toMatchObject({ version: 2, notes: 'second', status: 'done', customer: { phone: '555-0100' }, vehicle: { make: 'Patchable' } });
    expect(Date.parse(patched.body.updatedAt)).toBeGreaterThanOrEqual(Date.parse(build.updatedAt as string));

    const stale = await testApp.http().patch(`/api/builds/${build.id}`).set(as(fabA)).send({ version: 1, notes: 'mine' }).expect(409);
    expect(stale.body).toMatchObject({ code: 'conflict', current: { id: build.id, version: 2, notes: 'second' } });
  });

  it('keeps shops apart: another shop gets 404 and never sees the build in its list', async () => {
    const build = await createBuild(testApp, fabA, { vehicle: { make: 'Private' } });
    await testApp.http().get(`/api/builds/${build.id}`).set(as(fabB)).expect(404);
    await testApp.http().patch(`/api/builds/${build.id}`).set(as(fabB)).send({ version: 1, notes: 'x' }).expect(404);
    await testApp.http().get(`/api/builds/${build.id}/circuits`).set(as(fabB)).expect(404);
    await testApp.http().post(`/api/builds/${build.id}/circuits`).set(as(fabB)).send({ kind: 'fuel' }).expect(404);
    const listB = await testApp.http().get('/api/builds').set(as(fabB)).expect(200);
    expect(listB.body).toMatchObject({ total: 0, items: [] });
    await testApp.http().get('/api/builds/not-a-uuid').set(as(fabA)).expect(404);
  });
});
