import { circuitDocumentSchema, circuitKinds, type CircuitDocument } from '@linesmith/routing';
import type { UserEntity } from '../src/users/user.entity.js';
import { createBuild, createCircuit } from './support/builds.js';
import { createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

/** A document with one unit and its ports placed, at the given settings. */
function sketch(label: string, maxPressurePsi = 150): CircuitDocument {
  return circuitDocumentSchema.parse({
    schema: 'linesmith.circuit/1',
    circuit: { fluid: 'atf', maxPressurePsi, maxTempF: 250 },
    calibration: null,
    background: null,
    units: [
      {
        id: 'transmission',
        kind: 'transmission',
        label,
        x: 100,
        y: 200,
        mountGroup: 'powertrain',
        ports: [{ id: 'out', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'out', dx: 10, dy: 0 }],
      },
    ],
    lines: [],
    heatZones: [],
  });
}

describe('circuits, drafts and revisions (e2e)', () => {
  let testApp: TestApp;
  let shopA: TestShop;
  let shopB: TestShop;
  let fabA: string;
  let fabAUser: UserEntity;
  let fabA2: string;
  let reviewerA: string;
  let fabB: string;
  let buildId: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    shopA = await createTestShop(testApp, 'circuits-a');
    shopB = await createTestShop(testApp, 'circuits-b');
    fabAUser = await shopA.addUser(['fabricator'], 'fab1');
    fabA = (await signIn(testApp, fabAUser.email)).accessToken;
    fabA2 = (await signIn(testApp, (await shopA.addUser(['fabricator'], 'fab2')).email)).accessToken;
    reviewerA = (await signIn(testApp, (await shopA.addUser(['reviewer'])).email)).accessToken;
    fabB = (await signIn(testApp, (await shopB.addUser(['fabricator'])).email)).accessToken;
    buildId = (await createBuild(testApp, fabA, { vehicle: { make: 'Redfern', model: 'Pickup' } })).id;
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shopA, shopB]);
    await testApp.close();
  });

  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  it('creates a circuit from its kind preset, with an empty draft carrying the same settings', async () => {
    const circuit = await createCircuit(testApp, fabA, buildId, { kind: 'transmission-cooler' });
    const preset = circuitKinds['transmission-cooler'];
    expect(circuit).toMatchObject({
      buildId,
      name: preset.label,
      kind: 'transmission-cooler',
      fluid: preset.fluid,
      maxPressurePsi: preset.maxPressurePsi,
      maxTempF: preset.maxTempF,
      status: 'draft',
      draftVersion: 1,
      version: 1,
    });
    const draft = await testApp.http().get(`/api/circuits/${circuit.id}/draft`).set(as(reviewerA)).expect(200);
    expect(draft.body).toEqual({
      draftVersion: 1,
      document: {
        schema: 'linesmith.circuit/1',
        circuit: { fluid: preset.fluid, maxPressurePsi: preset.maxPressurePsi, maxTempF: preset.maxTempF },
        calibration: null,
        background: null,
        units: [],
        lines: [],
        heatZones: [],
      },
    });
    const named = await createCircuit(testApp, fabA, buildId, { kind: 'fuel', name: 'E85 feed', fluid: 'e85', maxPressurePsi: 90 });
    expect(named).toMatchObject({ name: 'E85 feed', fluid: 'e85', maxPressurePsi: 90, maxTempF: circuitKinds.fuel.maxTempF });
    const list = await testApp.http().get(`/api/builds/${buildId}/circuits`).set(as(fabA)).expect(200);
    expect(list.body.map((c: { id: string }) => c.id)).toEqual([circuit.id, named.id]);
    await testApp.http().post(`/api/builds/${buildId}/circuits`).set(as(fabA)).send({ kind: 'hydraulic' }).expect(400);
    await testApp.http().post(`/api/builds/${buildId}/circuits`).set(as(reviewerA)).send({ kind: 'fuel' }).expect(403);
  });

  it('saves a draft only with If-Match: 428 without, 400 for an invalid document', async () => {
    const circuit = await createCircuit(testApp, fabA, buildId, { kind: 'transmission-cooler' });
    const url = `/api/circuits/${circuit.id}/draft`;
    const missing = await testApp.http().put(url).set(as(fabA)).send(sketch('A')).expect(428);
    expect(missing.body.code).toBe('precondition_required');
    await testApp.http().put(url).set(as(fabA)).set('If-Match', 'abc').send(sketch('A')).expect(400);
    const invalid = await testApp
      .http()
      .put(url)
      .set(as(fabA))
      .set('If-Match', '1')
      .send({ ...sketch('A'), lines: [{ id: 'l1', from: { unitId: 'ghost', portId: 'x' } }] })
      .expect(400);
    expect(invalid.body.code).toBe('validation_failed');
    const unknownVersion = await testApp.http().put(url).set(as(fabA)).set('If-Match', '1').send({ schema: 'linesmith.circuit/99' }).expect(400);
    expect(unknownVersion.body.issues[0].path).toBe('schema');

    const saved = await testApp.http().put(url).set(as(fabA)).set('If-Match', '"1"').send(sketch('A')).expect(200);
    expect(saved.body).toEqual({ draftVersion: 2 });
  });

  it('two clients saving on the same version: one wins, the other gets 409 with the winner and loses nothing', async () => {
    const circuit = await createCircuit(testApp, fabA, buildId, { kind: 'transmission-cooler' });
    const url = `/api/circuits/${circuit.id}/draft`;
    const [first, second] = await Promise.all([
      testApp.http().put(url).set(as(fabA)).set('If-Match', '1').send(sketch('from client one')),
      testApp.http().put(url).set(as(fabA2)).set('If-Match', '1').send(sketch('from client two')),
    ]);
    expect([first.status, second.status].sort()).toEqual([200, 409]);
    const [winner, loser] = first.status === 200 ? [first, second] : [second, first];
    const winnerLabel = winner === first ? 'from client one' : 'from client two';
    expect(winner.body).toEqual({ draftVersion: 2 });
    expect(loser.body).toMatchObject({ code: 'conflict', current: { draftVersion: 2 } });
    expect(loser.body.current.document.units[0].label).toBe(winnerLabel);

    const stored = await testApp.http().get(url).set(as(fabA)).expect(200);
    expect(stored.body).toEqual({ draftVersion: 2, document: sketch(winnerLabel) });
    // The loser merges onto the current version and saves.
    const retried = await testApp.http().put(url).set(as(fabA)).set('If-Match', '2').send(sketch('merged')).expect(200);
    expect(retried.body.draftVersion).toBe(3);
  });

  it('keeps the circuit settings and the draft in step both ways', async () => {
    const circuit = await createCircuit(testApp, fabA, buildId, { kind: 'transmission-cooler' });
    const url = `/api/circuits/${circuit.id}`;
    // A saved sketch that changes the pressure moves the circuit's column and version.
    await testApp.http().put(`${url}/draft`).set(as(fabA)).set('If-Match', '1').send(sketch('A', 180)).expect(200);
    const afterDraft = await testApp.http().get(url).set(as(fabA)).expect(200);
    expect(afterDraft.body).toMatchObject({ maxPressurePsi: 180, draftVersion: 2, version: 2 });
    // A sketch save that leaves the settings alone does not move the circuit version.
    await testApp.http().put(`${url}/draft`).set(as(fabA)).set('If-Match', '2').send(sketch('B', 180)).expect(200);
    expect((await testApp.http().get(url).set(as(fabA)).expect(200)).body).toMatchObject({ draftVersion: 3, version: 2 });

    // A settings patch is written into the draft, keeps the sketch, and moves the draft version.
    const patched = await testApp.http().patch(url).set(as(fabA)).send({ version: 2, fluid: 'engine-oil', name: 'Renamed' }).expect(200);
    expect(patched.body).toMatchObject({ fluid: 'engine-oil', name: 'Renamed', version: 3, draftVersion: 4 });
    const draft = await testApp.http().get(`${url}/draft`).set(as(fabA)).expect(200);
    expect(draft.body.draftVersion).toBe(4);
    expect(draft.body.document.circuit).toEqual({ fluid: 'engine-oil', maxPressurePsi: 180, maxTempF: 250 });
    expect(draft.body.document.units[0].label).toBe('B');
    // A rename alone leaves the draft version.
    const renamed = await testApp.http().patch(url).set(as(fabA)).send({ version: 3, name: 'Again' }).expect(200);
    expect(renamed.body).toMatchObject({ version: 4, draftVersion: 4 });

    const stale = await testApp.http().patch(url).set(as(fabA)).send({ version: 3, name: 'Late' }).expect(409);
    expect(stale.body).toMatchObject({ code: 'conflict', current: { name: 'Again', version: 4 } });
    await testApp.http().patch(url).set(as(fabA)).send({ version: 4, maxPressurePsi: -1 }).expect(400);
  });

  it('numbers revisions 1, 2, … in one transaction; a later draft change leaves a revision as it was', async () => {
    const circuit = await createCircuit(testApp, fabA, buildId, { kind: 'transmission-cooler' });
    const url = `/api/circuits/${circuit.id}`;
    await testApp.http().put(`${url}/draft`).set(as(fabA)).set('If-Match', '1').send(sketch('first')).expect(200);
    const one = await testApp.http().post(`${url}/revisions`).set(as(fabA)).send({ message: 'Units placed' }).expect(201);
    const author = { id: fabAUser.id, displayName: fabAUser.displayName };
    expect(one.body).toMatchObject({ circuitId: circuit.id, number: 1, message: 'Units placed', draftVersion: 2, authorId: author.id, author });
    expect(one.body.document).toEqual(sketch('first'));

    await testApp.http().put(`${url}/draft`).set(as(fabA)).set('If-Match', '2').send(sketch('second')).expect(200);
    const two = await testApp.http().post(`${url}/revisions`).set(as(fabA)).send({}).expect(201);
    expect(two.body).toMatchObject({ number: 2, message: '', draftVersion: 3 });
    await testApp.http().put(`${url}/draft`).set(as(fabA)).set('If-Match', '3').send(sketch('third')).expect(200);

    const first = await testApp.http().get(`${url}/revisions/1`).set(as(reviewerA)).expect(200);
    expect(first.body.document.units[0].label).toBe('first');
    expect(first.body.author).toEqual(author);
    expect((await testApp.http().get(`${url}/revisions/2`).set(as(fabA)).expect(200)).body.document.units[0].label).toBe('second');

    // Concurrent snapshots still take distinct, consecutive numbers (row lock on the circuit).
    const burst = await Promise.all([1, 2, 3].map(() => testApp.http().post(`${url}/revisions`).set(as(fabA)).send({ message: 'burst' })));
    expect(burst.map((response) => response.status)).toEqual([201, 201, 201]);
    expect(burst.map((response) => response.body.number).sort()).toEqual([3, 4, 5]);

    const list = await testApp.http().get(`${url}/revisions`).set(as(fabA)).expect(200);
    expect(list.body.map((r: { number: number }) => r.number)).toEqual([1, 2, 3, 4, 5]);
    expect(list.body[0]).not.toHaveProperty('document');
    expect(list.body.map((r: { author: unknown }) => r.author)).toEqual([author, author, author, author, author]);
    await testApp.http().get(`${url}/revisions/9`).set(as(fabA)).expect(404);
    await testApp.http().get(`${url}/revisions/zero`).set(as(fabA)).expect(404);

    // The database itself refuses to rewrite a revision.
    await expect(
      testApp.dataSource.query(`UPDATE "circuit_revisions" SET "document" = '{}'::jsonb WHERE "id" = $1`, [one.body.id]),
    ).rejects.toThrow(/immutable/);
  });

  it('checks the draft through the shop rules', async () => {
    const circuit = await createCircuit(testApp, fabA, buildId, { kind: 'transmission-cooler' });
    await testApp.http().put(`/api/circuits/${circuit.id}/draft`).set(as(fabA)).set('If-Match', '1').send(sketch('A')).expect(200);
    const check = await testApp.http().get(`/api/circuits/${circuit.id}/check`).set(as(reviewerA)).expect(200);
    // The one port has no line and no plug: the open-port caution of DOMAIN §5.
    expect(check.body.flags).toEqual(
      expect.arrayContaining([expect.objectContaining({ code: 'open-port', severity: 'caution' })]),
    );
    expect(check.body).toHaveProperty('bom');
  });

  it('deletes only a draft circuit (204); any other status answers 409', async () => {
    const draft = await createCircuit(testApp, fabA, buildId, { kind: 'coolant' });
    await testApp.http().post(`/api/circuits/${draft.id}/revisions`).set(as(fabA)).send({}).expect(201);
    await testApp.http().delete(`/api/circuits/${draft.id}`).set(as(reviewerA)).expect(403);
    await testApp.http().delete(`/api/circuits/${draft.id}`).set(as(fabA)).expect(204);
    await testApp.http().get(`/api/circuits/${draft.id}`).set(as(fabA)).expect(404);

    const approved = await createCircuit(testApp, fabA, buildId, { kind: 'coolant' });
    await testApp.dataSource.query(`UPDATE "circuits" SET "status" = 'approved' WHERE "id" = $1`, [approved.id]);
    const refused = await testApp.http().delete(`/api/circuits/${approved.id}`).set(as(fabA)).expect(409);
    expect(refused.body.message).toMatch(/approved/);
  });

  it('keeps shops apart: every circuit route answers 404 to another shop', async () => {
    const circuit = await createCircuit(testApp, fabA, buildId, { kind: 'fuel' });
    await testApp.http().post(`/api/circuits/${circuit.id}/revisions`).set(as(fabA)).send({}).expect(201);
    const url = `/api/circuits/${circuit.id}`;
    await testApp.http().get(url).set(as(fabB)).expect(404);
    await testApp.http().patch(url).set(as(fabB)).send({ version: 1, name: 'x' }).expect(404);
    await testApp.http().delete(url).set(as(fabB)).expect(404);
    await testApp.http().get(`${url}/draft`).set(as(fabB)).expect(404);
    await testApp.http().put(`${url}/draft`).set(as(fabB)).set('If-Match', '1').send(sketch('x')).expect(404);
    await testApp.http().get(`${url}/revisions`).set(as(fabB)).expect(404);
    await testApp.http().get(`${url}/revisions/1`).set(as(fabB)).expect(404);
    await testApp.http().post(`${url}/revisions`).set(as(fabB)).send({}).expect(404);
    await testApp.http().get(`${url}/check`).set(as(fabB)).expect(404);
    // …and the draft is untouched.
    expect((await testApp.http().get(`${url}/draft`).set(as(fabA)).expect(200)).body.draftVersion).toBe(1);
  });
});
