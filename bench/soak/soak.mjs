// npm run soak (scripts/soak.sh starts the server on a private PostgreSQL): three bounded checks.
//  1. Load: 100 virtual users (20 invented users, each virtual user with its own circuit) for 60 s
//     over reads (builds list, circuit, parts), draft saves with If-Match and checks.
//  2. Fault: PostgreSQL restarts (pg_ctl restart -m fast) 20 s into the load: the API answers 503
//     while it is down, is healthy again within 5 s of PostgreSQL being back, and every save it
//     acknowledged is stored (per circuit: final draftVersion = starting version + acknowledged saves).
//  3. Two clients save one draft at the same time: every 409 carries a document some client had
//     saved, versions never repeat, and the stored draft is the last acknowledged save.
// Prints a summary; exits non-zero when a check fails.
import autocannon from 'autocannon';
import { spawn } from 'node:child_process';
import { ApiError, ApiSession, demoUsers, serverUrl } from '../lib/api-client.mjs';
import { coolerDraft } from '../lib/drafts.mjs';
import { percentile } from '../lib/stats.mjs';

const USERS = 20;
const VIRTUAL_USERS = 100;
const LOAD_S = 60;
const FAULT_AT_S = 20;
const RECOVERY_GOAL_MS = 5000;
const CONCURRENT_ATTEMPTS = 50;
const PASSWORD = 'soak-password-0042';
const base = serverUrl();

const checks = [];
function check(name, ok, detail) {
  checks.push({ name, ok, detail });
}

const markerOf = (doc) => doc.units.find((u) => u.kind === 'transmission')?.label ?? '';
const sleep = (ms) => new Promise((done) => setTimeout(done, ms));

/** 20 fabricators created by the demo admin; one build; one circuit per virtual user with a drawn draft. */
async function setUp() {
  const admin = await ApiSession.signIn(base, demoUsers.admin);
  const sessions = [];
  for (let i = 1; i <= USERS; i += 1) {
    const email = `soak.fabricator${String(i).padStart(2, '0')}@tidewater.example`;
    await admin.post('/users', { email, displayName: `Soak fabricator ${i}`, roles: ['fabricator'], password: PASSWORD });
    sessions.push(await ApiSession.signIn(base, email, PASSWORD));
  }
  const build = await sessions[0].post('/builds', { vehicle: { make: 'Soak', model: 'Load test' }, notes: 'Created by npm run soak.' });
  const parts = await sessions[0].allParts();
  const users = [];
  for (let v = 0; v < VIRTUAL_USERS; v += 1) {
    const session = sessions[v % USERS];
    const circuit = await session.post(`/builds/${build.id}/circuits`, { kind: 'transmission-cooler', name: `Soak circuit ${v + 1}` });
    const { document, draftVersion } = await session.get(`/circuits/${circuit.id}/draft`);
    const transmission = { id: 'transmission', kind: 'transmission', label: 'x', x: 320, y: 420, rotation: 0, mountGroup: 'powertrain', ports: [
      { id: 'cooler-out', label: 'To cooler', connection: { family: 'npt', size: '1/4', gender: 'female' }, role: 'out', dx: 48, dy: -24 },
      { id: 'cooler-return', label: 'From cooler', connection: { family: 'orb', size: '-6', gender: 'female' }, role: 'return', dx: 48, dy: 24, feedsLubrication: true, requirement: { feature: 'long-nose', reason: 'The return feeds the gear train.' } },
    ] };
    const cooler = { id: 'cooler', kind: 'cooler', label: 'Front cooler', x: 660, y: 160, rotation: 0, mountGroup: 'chassis', ports: [
      { id: 'in', label: 'Inlet', connection: { family: 'invflare45', size: '3/8', gender: 'female' }, role: 'feed', dx: -60, dy: -20 },
      { id: 'out', label: 'Outlet', connection: { family: 'invflare45', size: '3/8', gender: 'female' }, role: 'out', dx: -60, dy: 20 },
    ] };
    const draft = coolerDraft({ ...document, units: [transmission, cooler] }, parts, 'start');
    const version = await session.saveDraft(circuit.id, draftVersion, draft);
    const template = JSON.stringify(draft).replace('"label":"start"', '"label":"__MARK__"');
    users.push({ index: v, session, circuitId: circuit.id, startVersion: version, version, template, attempts: 0, acks: [], landedUnacked: 0, anomalies: 0 });
  }
  return { admin, sessions, build, parts, users };
}

/** Runs `pg_ctl restart -m fast` on the soak's PostgreSQL (through common.sh, as the postgres user). */
function restartPostgres() {
  const script = `source "$ROOT/scripts/lib/common.sh" && as_pg "$(pg_bin)/pg_ctl" -D "$PG_DATA_DIR" -l "$PG_DATA_DIR/server.log" -w -t 30 restart -m fast >/dev/null`;
  return new Promise((resolve, reject) => {
    const child = spawn('bash', ['-c', script], { stdio: ['ignore', 'ignore', 'inherit'] });
    child.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`pg_ctl restart exited ${code}`))));
  });
}

/** Restarts PostgreSQL and polls /api/health every 50 ms until it answers 200 again. */
async function fault(t0) {
  const timeline = { startedAt: Date.now() - t0, healthStatuses: {} };
  let polling = true;
  let backAt = 0;
  let healthyAt = 0;
  const poll = (async () => {
    while (polling) {
      const status = await fetch(`${base}/api/health`, { signal: AbortSignal.timeout(5000) }).then((r) => r.status, () => 0);
      timeline.healthStatuses[status] = (timeline.healthStatuses[status] ?? 0) + 1;
      if (status === 200 && backAt && !healthyAt) {
        healthyAt = Date.now();
        polling = false;
      }
      await sleep(50);
    }
  })();
  await restartPostgres();
  backAt = Date.now();
  timeline.pgBackAt = backAt - t0;
  const giveUp = setTimeout(() => (polling = false), 30_000);
  await poll;
  clearTimeout(giveUp);
  timeline.healthyAt = healthyAt ? healthyAt - t0 : NaN;
  timeline.recoveryMs = healthyAt ? healthyAt - backAt : NaN;
  return timeline;
}

/** Each connection is one virtual user cycling through reads, a save and a check. */
function requestsOf(user) {
  const path = `/api/circuits/${user.circuitId}`;
  const auth = user.session.authHeader;
  return [
    { method: 'GET', path: '/api/builds?pageSize=20', headers: auth },
    { method: 'GET', path, headers: auth },
    { method: 'GET', path: '/api/parts?pageSize=50', headers: auth },
    {
      method: 'PUT',
      path: `${path}/draft`,
      setupRequest(request) {
        user.attempts += 1;
        user.pending = `save ${user.index}-${user.attempts}`;
        user.inFlight = true;
        return { ...request, headers: { ...auth, 'content-type': 'application/json', 'if-match': `"${user.version}"` }, body: user.template.replace('__MARK__', user.pending) };
      },
      onResponse(status, body) {
        user.inFlight = false;
        if (status === 200) {
          const { draftVersion } = JSON.parse(body);
          if (draftVersion !== user.version + 1) user.anomalies += 1;
          user.version = draftVersion;
          user.acks.push({ version: draftVersion, marker: user.pending });
        } else if (status === 409) {
          // Only this virtual user writes this circuit: a 409 means an earlier save landed while its answer was lost.
          const current = JSON.parse(body).current;
          user.landedUnacked += current.draftVersion - user.version;
          user.version = current.draftVersion;
        }
      },
    },
    { method: 'GET', path: `${path}/check`, headers: auth },
  ];
}

async function loadWithFault(users) {
  const samples = { latencies: [], byStatus: {}, outside: [] };
  let faultWindow = null;
  let next = 0;
  const t0 = Date.now();
  const instance = autocannon({
    url: base,
    connections: VIRTUAL_USERS,
    duration: LOAD_S,
    timeout: 20,
    requests: [{ method: 'GET', path: '/api/health' }],
    setupClient(client) {
      client.setRequests(requestsOf(users[next++ % users.length]));
    },
  });
  instance.on('response', (_client, status, _bytes, ms) => {
    samples.byStatus[status] = (samples.byStatus[status] ?? 0) + 1;
    if (status >= 200 && status < 300) samples.latencies.push(ms);
    else if (status !== 409) samples.outside.push({ status, at: Date.now() - t0 });
  });
  const faultRun = sleep(FAULT_AT_S * 1000).then(() => fault(t0)).then((timeline) => (faultWindow = timeline));
  const result = await instance;
  await faultRun;
  return { samples, result, faultWindow };
}

async function concurrentEdits(sessions, build, parts) {
  const [a, b] = [sessions[0], sessions[1]];
  const circuit = await a.post(`/builds/${build.id}/circuits`, { kind: 'transmission-cooler', name: 'Soak: two editors' });
  const { document, draftVersion } = await a.get(`/circuits/${circuit.id}/draft`);
  const acks = [];
  const conflicts = [];
  const client = async (session, name) => {
    let version = draftVersion;
    for (let n = 1; n <= CONCURRENT_ATTEMPTS; n += 1) {
      const marker = `${name} ${n}`;
      const doc = { ...document, units: [{ id: 'transmission', kind: 'transmission', label: marker, x: 320, y: 420, rotation: 0, mountGroup: 'powertrain', ports: [] }] };
      try {
        version = await session.saveDraft(circuit.id, version, doc);
        acks.push({ version, marker });
      } catch (error) {
        if (!(error instanceof ApiError) || error.status !== 409) throw error;
        const current = error.body.current;
        conflicts.push({ version: current?.draftVersion, marker: current ? markerOf(current.document) : undefined });
        version = current?.draftVersion ?? version;
      }
    }
  };
  await Promise.all([client(a, 'client A'), client(b, 'client B')]);
  const final = await a.get(`/circuits/${circuit.id}/draft`);
  const ackByVersion = new Map(acks.map((ack) => [ack.version, ack.marker]));
  const last = acks.reduce((max, ack) => (ack.version > max.version ? ack : max), { version: draftVersion, marker: '' });
  return {
    attempts: 2 * CONCURRENT_ATTEMPTS,
    acks: acks.length,
    conflicts: conflicts.length,
    versionsUnique: ackByVersion.size === acks.length,
    everyConflictCarriedAWinner: conflicts.every((c) => ackByVersion.get(c.version) === c.marker),
    finalIsLastAck: final.draftVersion === last.version && markerOf(final.document) === last.marker,
    finalCountsAcks: final.draftVersion === draftVersion + acks.length,
  };
}

const fmt = (n) => (Number.isFinite(n) ? n.toFixed(1) : '—');

async function main() {
  const setupStart = Date.now();
  const { sessions, build, parts, users } = await setUp();
  console.log(`set-up: ${USERS} users, ${VIRTUAL_USERS} circuits with drawn drafts in ${((Date.now() - setupStart) / 1000).toFixed(1)} s`);

  console.log(`load: ${VIRTUAL_USERS} virtual users for ${LOAD_S} s; PostgreSQL restarts at ${FAULT_AT_S} s …`);
  const { samples, result, faultWindow } = await loadWithFault(users);
  const lat = samples.latencies;
  const windowEnd = (faultWindow.healthyAt || faultWindow.pgBackAt) + 1000;
  const inOutage = (s) => s.at >= faultWindow.startedAt && s.at <= windowEnd;
  const unexpected = samples.outside.filter((s) => !(s.status === 503 && inOutage(s)));
  const outage503 = samples.outside.filter((s) => s.status === 503 && inOutage(s)).length + (faultWindow.healthStatuses[503] ?? 0);
  console.log(`  requests: ${result.requests.total}, ${fmt(result.requests.average)} per s; status counts ${JSON.stringify(samples.byStatus)}`);
  console.log(`  2xx latency ms: p50 ${fmt(percentile(lat, 50))}, p95 ${fmt(percentile(lat, 95))}, p99 ${fmt(percentile(lat, 99))}, max ${fmt(Math.max(...lat))}`);
  console.log(`  connection errors ${result.errors}, timeouts ${result.timeouts}`);
  check('load: no errors outside the outage (non-2xx other than 409, connection errors, timeouts)', unexpected.length === 0 && result.errors === 0 && result.timeouts === 0,
    `${unexpected.length} unexpected answers ${JSON.stringify(unexpected.slice(0, 5))}, ${result.errors} connection errors, ${result.timeouts} timeouts`);

  console.log(`fault: restart began ${fmt(faultWindow.startedAt / 1000)} s, PostgreSQL back ${fmt(faultWindow.pgBackAt / 1000)} s, API healthy ${fmt(faultWindow.healthyAt / 1000)} s; health probe statuses ${JSON.stringify(faultWindow.healthStatuses)}`);
  check('fault: the API answered 503 while PostgreSQL was down', outage503 > 0, `${outage503} answers of 503 in the outage`);
  check(`fault: healthy within ${RECOVERY_GOAL_MS / 1000} s of PostgreSQL being back`, faultWindow.recoveryMs <= RECOVERY_GOAL_MS, `${fmt(faultWindow.recoveryMs)} ms`);

  let lost = 0;
  let mismatched = 0;
  let inFlightLanded = 0;
  for (const user of users) {
    const stored = await user.session.get(`/circuits/${user.circuitId}/draft`);
    const expected = user.startVersion + user.acks.length + user.landedUnacked;
    // A save still in flight when the load stopped may have landed with its answer unread.
    const landedAtStop = user.inFlight && stored.draftVersion === expected + 1 && markerOf(stored.document) === user.pending;
    if (landedAtStop) inFlightLanded += 1;
    if ((stored.draftVersion !== expected && !landedAtStop) || user.anomalies) mismatched += 1;
    const lastAck = user.acks.at(-1);
    if (lastAck && user.landedUnacked === 0 && !landedAtStop && markerOf(stored.document) !== lastAck.marker) lost += 1;
  }
  const acked = users.reduce((n, u) => n + u.acks.length, 0);
  const unacked = users.reduce((n, u) => n + u.landedUnacked, 0);
  console.log(`  saves: ${users.reduce((n, u) => n + u.attempts, 0)} attempted, ${acked} acknowledged, ${unacked} landed without an answer (seen as 409), ${inFlightLanded} in flight when the load stopped and stored`);
  check('fault: every acknowledged save is stored (final draftVersion = start + acknowledged [+ landed unanswered])', mismatched === 0 && lost === 0,
    `${mismatched} circuits with a version count off, ${lost} whose stored draft is not the last acknowledged save`);

  const edits = await concurrentEdits(sessions, build, parts);
  console.log(`concurrent edits: ${edits.attempts} saves attempted by two clients, ${edits.acks} acknowledged, ${edits.conflicts} answered 409`);
  check('concurrent edits: conflicts happened', edits.conflicts > 0, `${edits.conflicts} conflicts`);
  check('concurrent edits: every 409 carried a saved winner', edits.everyConflictCarriedAWinner, '');
  check('concurrent edits: no version acknowledged twice; final draft = last acknowledged save', edits.versionsUnique && edits.finalIsLastAck && edits.finalCountsAcks, JSON.stringify(edits));

  console.log('\nsummary');
  for (const c of checks) console.log(`  ${c.ok ? 'PASS' : 'FAIL'}  ${c.name}${c.detail ? ` — ${c.detail}` : ''}`);
  const failed = checks.filter((c) => !c.ok).length;
  console.log(`\n${checks.length - failed} passed, ${failed} failed`);
  process.exitCode = failed ? 1 : 0;
}

main().catch((error) => {
  console.error('soak aborted:', error);
  process.exitCode = 1;
});
