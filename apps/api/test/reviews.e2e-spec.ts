import type { CircuitDocumentInput } from '@linesmith/routing';
import { createBuild, createCircuit } from './support/builds.js';
import { coolerLineDocument } from './support/approved-circuit.js';
import { demoIdLookup, seedCatalogueInto } from './support/demo-catalogue.js';
import { bearer, createTestShop, removeShops, signIn, type TestShop } from './support/fixtures.js';
import { startTestApp, type TestApp } from './support/test-app.js';

interface Caller {
  id: string;
  token: string;
}

describe('reviews: submit, acknowledge, approve or return, audit trail, comparison (e2e)', () => {
  let testApp: TestApp;
  let shop: TestShop;
  let otherShop: TestShop;
  let ids: Map<string, string>;
  let fab: Caller;
  let reviewer: Caller;
  let reviewer2: Caller;
  let clerk: Caller;
  let fabReviewer: Caller;
  let outsider: Caller;
  let buildId: string;

  const login = async (target: TestShop, roles: Parameters<TestShop['addUser']>[0], label: string): Promise<Caller> => {
    const user = await target.addUser(roles, label);
    return { id: user.id, token: (await signIn(testApp, user.email)).accessToken };
  };

  beforeAll(async () => {
    testApp = await startTestApp();
    shop = await createTestShop(testApp, 'reviews');
    otherShop = await createTestShop(testApp, 'reviews-other');
    ids = await seedCatalogueInto(testApp, shop.shop);
    fab = await login(shop, ['fabricator'], 'fab');
    reviewer = await login(shop, ['reviewer'], 'lead');
    reviewer2 = await login(shop, ['reviewer'], 'lead2');
    clerk = await login(shop, ['parts-clerk'], 'clerk');
    fabReviewer = await login(shop, ['fabricator', 'reviewer'], 'both');
    outsider = await login(otherShop, ['reviewer', 'admin'], 'outsider');
    buildId = (await createBuild(testApp, fab.token, { vehicle: { year: '1974', make: 'Redfern', model: 'Pickup' } })).id;
  });

  afterAll(async () => {
    await removeShops(testApp.dataSource, [shop, otherShop]);
    await testApp.close();
  });

  const as = (caller: Caller) => bearer(caller.token);
  const id = demoIdLookup(() => ids);

  /**
   * A -6 cooler line, 30 in straight at 10 px/in, from a -6 O-ring boss port (powertrain) to a
   * 3/8 in inverted-flare port (chassis) — the document of rules.e2e-spec, whose hand-worked cut
   * length is 28 in. Two cautions: without supports its one 30 in span is a `support-gap`, and the
   * cooler's port is drawn with the role `feed`, which sends fluid out as the transmission's `out`
   * does (`flow-direction`). The inverted-flare adapter's 0.3 in bore is exactly 80 % of the hose's
   * 0.375 in bore, which meets the restriction ratio, so it raises no `restriction`.
   */
  const coolerLine = (edit?: (doc: CircuitDocumentInput) => void): CircuitDocumentInput => {
    const doc = coolerLineDocument(id);
    edit?.(doc);
    return doc;
  };

  /** A circuit of the build whose draft is `doc`. */
  async function circuitWith(doc: CircuitDocumentInput, name: string) {
    const circuit = await createCircuit(testApp, fab.token, buildId, { kind: 'transmission-cooler', name });
    await testApp.http().put(`/api/circuits/${circuit.id}/draft`).set(as(fab)).set('If-Match', '1').send(doc).expect(200);
    return circuit.id;
  }

  const submit = (circuitId: string, caller: Caller, message?: string) =>
    testApp.http().post(`/api/circuits/${circuitId}/submit`).set(as(caller)).send(message === undefined ? {} : { message });
  const review = (circuitId: string, caller: Caller) => testApp.http().get(`/api/circuits/${circuitId}/review`).set(as(caller));
  const acknowledge = (circuitId: string, caller: Caller, body: object) =>
    testApp.http().post(`/api/circuits/${circuitId}/review/acknowledgements`).set(as(caller)).send(body);
  const approve = (circuitId: string, caller: Caller, body: object = {}) =>
    testApp.http().post(`/api/circuits/${circuitId}/review/approve`).set(as(caller)).send(body);
  const returnIt = (circuitId: string, caller: Caller, body: object) =>
    testApp.http().post(`/api/circuits/${circuitId}/review/return`).set(as(caller)).send(body);
  /** Acknowledges every open caution of the review under way. */
  async function acknowledgeAll(circuitId: string, caller: Caller): Promise<void> {
    const open = (await review(circuitId, caller).expect(200)).body.openItems.unacknowledgedCautions as Array<{ key: string }>;
    for (const flag of open) await acknowledge(circuitId, caller, { flagKey: flag.key, note: 'Checked on the vehicle' }).expect(201);
  }
  const notificationsOf = (circuitName: string) =>
    testApp.dataSource.query<Array<{ recipient_id: string; subject: string; sent_at: Date | null }>>(
      `SELECT "recipient_id", "subject", "sent_at" FROM "notifications" WHERE "shop_id" = $1 AND "subject" LIKE $2 ORDER BY "created_at", "recipient_id"`,
      [shop.shop.id, `%${circuitName}%`],
    );

  it('submit → queue → acknowledge the caution → approve, with the audit rows in order and the revision locked', async () => {
    const circuitId = await circuitWith(coolerLine(), 'Cooler A');
    const before = (await testApp.http().get(`/api/circuits/${circuitId}`).set(as(fab)).expect(200)).body;

    // Role by decorator: a reviewer or parts clerk cannot submit; the fabricator can.
    await submit(circuitId, reviewer).expect(403);
    await submit(circuitId, clerk).expect(403);
    const submitted = await submit(circuitId, fab, 'Ready for a look').expect(200);
    expect(submitted.body).toMatchObject({ id: circuitId, status: 'in-review', version: before.version + 1, draftVersion: before.draftVersion });

    // State by the service: it is under review already.
    const again = await submit(circuitId, fab).expect(409);
    expect(again.body).toMatchObject({ code: 'invalid_transition', currentStatus: 'in-review' });
    expect(again.body.message).toMatch(/in-review/);

    // The queue, for reviewers only, with the counts of the server's check at submission.
    await testApp.http().get('/api/reviews').set(as(fab)).expect(403);
    const queue = await testApp.http().get('/api/reviews?status=in-review&sort=submittedAt').set(as(reviewer)).expect(200);
    const row = queue.body.find((entry: { circuitId: string }) => entry.circuitId === circuitId);
    expect(row).toMatchObject({
      circuitName: 'Cooler A',
      build: { id: buildId, label: '1974 Redfern Pickup' },
      fabricator: { id: fab.id, displayName: expect.stringContaining('fab') },
      revisionNumber: 1,
      status: 'in-review',
      blockers: 0,
      cautions: 2,
      submittedAt: expect.stringMatching(/^\d{4}-/),
    });
    expect((await testApp.http().get('/api/reviews').set(as(outsider)).expect(200)).body).toEqual([]);

    // Everyone in the shop reads the review; another shop cannot see it.
    const opened = await review(circuitId, clerk).expect(200);
    expect(opened.body).toMatchObject({ status: 'in-review', circuitStatus: 'in-review', revisionNumber: 1, message: 'Ready for a look' });
    expect(opened.body.decision).toBeUndefined();
    expect(opened.body.submittedBy).toMatchObject({ id: fab.id });
    expect(opened.body.evaluation.lines[0].cutLengthIn).toBe(28);
    expect(opened.body.openItems.blockers).toEqual([]);
    const openKeys: string[] = opened.body.openItems.unacknowledgedCautions.map((flag: { key: string }) => flag.key);
    expect(openKeys).toHaveLength(2);
    // Both point at the line: the support gap and the flow direction.
    expect(openKeys.sort()).toEqual(['flow-direction@line:L1', 'support-gap@line:L1']);
    const byCode = (code: string) => opened.body.openItems.unacknowledgedCautions.find((flag: { code: string }) => flag.code === code);
    const flow = byCode('flow-direction');
    const caution = byCode('support-gap');
    await review(circuitId, outsider).expect(404);

    // The fabricator cannot approve; nobody can approve over an unacknowledged caution.
    await approve(circuitId, fab).expect(403);
    const blocked = await approve(circuitId, reviewer).expect(409);
    expect(blocked.body.code).toBe('review_blocked');
    expect(blocked.body.openItems.unacknowledgedCautions.map((flag: { key: string }) => flag.key).sort()).toEqual([flow.key, caution.key].sort());

    // Acknowledging: reviewers only, a real caution, a note of at least 3 characters, once.
    await acknowledge(circuitId, fab, { flagKey: caution.key, note: 'fine by me' }).expect(403);
    const shortNote = await acknowledge(circuitId, reviewer, { flagKey: caution.key, note: 'ok' }).expect(400);
    expect(shortNote.body.issues.map((issue: { path: string }) => issue.path)).toEqual(['note']);
    await acknowledge(circuitId, reviewer, { flagKey: 'support-gap@line:L9', note: 'no such line' }).expect(400);
    const acked = await acknowledge(circuitId, reviewer, { flagKey: caution.key, note: 'Clamped to the frame rail at the bulkhead' }).expect(201);
    expect(acked.body).toMatchObject({ flagKey: caution.key, note: 'Clamped to the frame rail at the bulkhead', by: { id: reviewer.id } });
    await acknowledge(circuitId, reviewer2, { flagKey: caution.key, note: 'seen it too' }).expect(409);
    // One caution acknowledged is not enough: every caution must be.
    const stillBlocked = await approve(circuitId, reviewer).expect(409);
    expect(stillBlocked.body.openItems.unacknowledgedCautions.map((flag: { key: string }) => flag.key)).toEqual([flow.key]);
    await acknowledge(circuitId, reviewer2, { flagKey: flow.key, note: 'Cooler port is its inlet; flow checked on the vehicle' }).expect(201);

    const approved = await approve(circuitId, reviewer, { note: 'Good to build' }).expect(200);
    expect(approved.body).toMatchObject({
      status: 'approved',
      circuitStatus: 'approved',
      decision: { kind: 'approved', by: { id: reviewer.id }, note: 'Good to build' },
      openItems: { blockers: [], unacknowledgedCautions: [] },
      acknowledgements: [
        { flagKey: caution.key, by: { id: reviewer.id } },
        { flagKey: flow.key, by: { id: reviewer2.id } },
      ],
    });

    // The revision is locked: the API says who signed it off, and the database refuses changes.
    const revision = await testApp.http().get(`/api/circuits/${circuitId}/revisions/1`).set(as(fab)).expect(200);
    expect(revision.body).toMatchObject({ approvedById: reviewer.id, lockedAt: expect.stringMatching(/^\d{4}-/) });
    await expect(
      testApp.dataSource.query(`UPDATE "circuit_revisions" SET "message" = 'edited later' WHERE "id" = $1`, [revision.body.id]),
    ).rejects.toThrow(/locked/);
    await expect(
      testApp.dataSource.query(`UPDATE "circuit_revisions" SET "locked_at" = NULL WHERE "id" = $1`, [revision.body.id]),
    ).rejects.toThrow(/locked/);

    // No second decision, and an approved circuit is not submitted again.
    expect((await approve(circuitId, reviewer2).expect(409)).body.code).toBe('invalid_transition');
    expect((await returnIt(circuitId, reviewer2, { comments: 'too late' }).expect(409)).body.code).toBe('invalid_transition');
    expect((await submit(circuitId, fab).expect(409)).body.code).toBe('invalid_transition');

    const audit = await testApp.http().get(`/api/circuits/${circuitId}/audit`).set(as(clerk)).expect(200);
    expect(audit.body.map((event: { action: string; actor: { id: string }; revisionNumber: number }) => [event.action, event.actor.id, event.revisionNumber])).toEqual([
      ['submit', fab.id, 1],
      ['acknowledge', reviewer.id, 1],
      ['acknowledge', reviewer2.id, 1],
      ['approve', reviewer.id, 1],
    ]);
    expect(audit.body[1].details).toMatchObject({ flagKey: caution.key, note: 'Clamped to the frame rail at the bulkhead' });
    const times = audit.body.map((event: { at: string }) => Date.parse(event.at));
    expect([...times].sort((a, b) => a - b)).toEqual(times);
    await testApp.http().get(`/api/circuits/${circuitId}/audit`).set(as(outsider)).expect(404);

    // Submission told the reviewers (not the submitter); approval told the fabricator. Nothing sent yet.
    const notes = await notificationsOf('Cooler A');
    expect(notes.filter((note) => note.subject.startsWith('Review requested')).map((note) => note.recipient_id).sort()).toEqual(
      [reviewer.id, reviewer2.id, fabReviewer.id].sort(),
    );
    expect(notes.filter((note) => note.subject.startsWith('Approved')).map((note) => note.recipient_id)).toEqual([fab.id]);
    expect(notes.every((note) => note.sent_at === null)).toBe(true);
  });

  it('returns a circuit with a blocker, which cannot be acknowledged or approved; the fix goes back as revision 2', async () => {
    // No hose on the line: `incomplete-line` is a blocker.
    const circuitId = await circuitWith(coolerLine((doc) => (doc.lines[0]!.hosePartId = null)), 'Cooler B');
    await submit(circuitId, fab).expect(200);
    const opened = await review(circuitId, reviewer).expect(200);
    const blocker = opened.body.openItems.blockers.find((flag: { code: string }) => flag.code === 'incomplete-line');
    expect(blocker).toBeDefined();

    const ackBlocker = await acknowledge(circuitId, reviewer, { flagKey: blocker.key, note: 'looks fine' }).expect(400);
    expect(ackBlocker.body.message).toMatch(/blocker/i);
    const blocked = await approve(circuitId, reviewer).expect(409);
    expect(blocked.body).toMatchObject({ code: 'review_blocked' });
    expect(blocked.body.openItems.blockers.map((flag: { key: string }) => flag.key)).toContain(blocker.key);

    await returnIt(circuitId, fab, { comments: 'Pick a hose' }).expect(403);
    const noComments = await returnIt(circuitId, reviewer, {}).expect(400);
    expect(noComments.body.issues.map((issue: { path: string }) => issue.path)).toEqual(['comments']);
    const returned = await returnIt(circuitId, reviewer, { comments: 'Pick a hose for L1' }).expect(200);
    expect(returned.body).toMatchObject({
      status: 'returned',
      circuitStatus: 'returned',
      decision: { kind: 'returned', by: { id: reviewer.id }, comments: 'Pick a hose for L1' },
    });
    await acknowledge(circuitId, reviewer, { flagKey: 'support-gap@line:L1', note: 'after the fact' }).expect(409);

    // The fabricator fixes the draft and submits again: revision 2 enters the queue.
    const draft = await testApp.http().get(`/api/circuits/${circuitId}/draft`).set(as(fab)).expect(200);
    await testApp
      .http()
      .put(`/api/circuits/${circuitId}/draft`)
      .set(as(fab))
      .set('If-Match', String(draft.body.draftVersion))
      .send(coolerLine((doc) => (doc.lines[0]!.supports = [{ id: 's1', atIn: 15 }])))
      .expect(200);
    await submit(circuitId, fab, 'Hose picked, clamp added').expect(200);
    const queue = await testApp.http().get('/api/reviews?sort=build').set(as(reviewer)).expect(200);
    expect(queue.body.filter((entry: { circuitId: string }) => entry.circuitId === circuitId)).toEqual([
      expect.objectContaining({ revisionNumber: 2, blockers: 0, cautions: 1 }),
    ]);
    const returnedRows = await testApp.http().get('/api/reviews?status=returned').set(as(reviewer)).expect(200);
    expect(returnedRows.body.filter((entry: { circuitId: string }) => entry.circuitId === circuitId)).toEqual([
      expect.objectContaining({ revisionNumber: 1, status: 'returned', blockers: expect.any(Number) }),
    ]);

    const audit = await testApp.http().get(`/api/circuits/${circuitId}/audit`).set(as(fab)).expect(200);
    expect(audit.body.map((event: { action: string; revisionNumber: number }) => `${event.action}:${event.revisionNumber}`)).toEqual([
      'submit:1',
      'return:1',
      'submit:2',
    ]);
    expect(audit.body[1].details).toEqual({ comments: 'Pick a hose for L1' });
    const notes = await notificationsOf('Cooler B');
    expect(notes.filter((note) => note.subject.startsWith('Returned')).map((note) => note.recipient_id)).toEqual([fab.id]);
  });

  it('does not let the submitter approve or acknowledge their own submission, whatever roles they hold', async () => {
    const circuitId = await circuitWith(coolerLine(), 'Cooler C');
    await submit(circuitId, fabReviewer).expect(200);
    const [caution] = (await review(circuitId, fabReviewer).expect(200)).body.openItems.unacknowledgedCautions;
    expect((await acknowledge(circuitId, fabReviewer, { flagKey: caution.key, note: 'my own work' }).expect(403)).body.code).toBe('forbidden');
    await acknowledgeAll(circuitId, reviewer2);
    expect((await approve(circuitId, fabReviewer).expect(403)).body.code).toBe('forbidden');
    await approve(circuitId, reviewer2).expect(200);
  });

  it('serialises concurrent decisions: of an approve and a return racing, exactly one wins', async () => {
    const circuitId = await circuitWith(coolerLine((doc) => (doc.lines[0]!.supports = [{ id: 's1', atIn: 15 }])), 'Cooler D');
    await submit(circuitId, fab).expect(200);
    await acknowledgeAll(circuitId, reviewer);
    const [first, second] = await Promise.all([approve(circuitId, reviewer), returnIt(circuitId, reviewer2, { comments: 'Hold on' })]);
    expect([first.status, second.status].sort()).toEqual([200, 409]);
    const audit = await testApp.http().get(`/api/circuits/${circuitId}/audit`).set(as(fab)).expect(200);
    expect(audit.body.map((event: { action: string }) => event.action)).toEqual([
      'submit',
      'acknowledge',
      first.status === 200 ? 'approve' : 'return',
    ]);
  });

  it('compares two revisions: a re-routed line shows its old and new cut length', async () => {
    const circuitId = await circuitWith(coolerLine(), 'Cooler E');
    const url = `/api/circuits/${circuitId}`;
    await testApp.http().post(`${url}/revisions`).set(as(fab)).send({ message: 'straight' }).expect(201);
    // One corner at (15, 15) in with a 4 in bend radius: two legs of √(15² + 15²) = 21.2132 in at 90°.
    // Centreline (DOMAIN §4) = 42.4264 − 2·4·tan 45° + 4·π/2 = 40.7096 in; cut = 40.7096 − (0.95 + 0.80)
    // − (1.05 + 0.80) + max(1.5, 4 % × 40.7096 = 1.6284) = 38.7380 → up to the next 1/8 in = 38-3/4 in.
    // Straight: 30 − 3.6 + 1.5 = 27.9 → 28 in (as worked in rules.e2e-spec).
    await testApp
      .http()
      .put(`${url}/draft`)
      .set(as(fab))
      .set('If-Match', '2')
      .send(coolerLine((doc) => (doc.lines[0]!.points = [{ x: 150, y: 150, bendRadiusIn: 4 }])))
      .expect(200);
    await testApp.http().post(`${url}/revisions`).set(as(fab)).send({ message: 'around the pan' }).expect(201);

    const compared = await testApp.http().get(`${url}/compare?from=1&to=2`).set(as(clerk)).expect(200);
    expect(compared.body.comparison.lines.rerouted).toEqual([{ lineId: 'L1', oldCutLengthIn: 28, newCutLengthIn: 38.75 }]);
    expect(compared.body.comparison.changedIds).toEqual(['L1']);
    expect(compared.body.before).toMatchObject({ ref: 1, document: { lines: [{ points: [] }] } });
    expect(compared.body.after.ref).toBe(2);
    expect(compared.body.after.evaluation.lines[0].cutLengthIn).toBe(38.75);

    const toDraft = await testApp.http().get(`${url}/compare?from=2&to=draft`).set(as(fab)).expect(200);
    expect(toDraft.body.comparison.changedIds).toEqual([]);
    expect(toDraft.body.after.ref).toBe('draft');

    await testApp.http().get(`${url}/compare?from=1&to=9`).set(as(fab)).expect(404);
    const bad = await testApp.http().get(`${url}/compare?from=latest&to=2`).set(as(fab)).expect(400);
    expect(bad.body.issues.map((issue: { path: string }) => issue.path)).toContain('from');
    await testApp.http().get(`${url}/compare?from=1&to=2`).set(as(outsider)).expect(404);
  });
});
