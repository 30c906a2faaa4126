// Check endpoint vs health: the authoritative rules check of the demo transmission-cooler draft
// (four lines drawn out, see lib/drafts.mjs) against the bare health probe, each at 50 connections
// for 10 s in the same run. Goal: p95(check) ≤ 3 × p95(health).
import autocannon from 'autocannon';
import { ApiSession, demoUsers, serverUrl } from './lib/api-client.mjs';
import { coolerDraft } from './lib/drafts.mjs';
import { percentile, row } from './lib/stats.mjs';

const CONNECTIONS = 50;
const DURATION_S = 10;
const RATIO_GOAL = 3;

/** Latencies of every 2xx answer, and the count of the others. */
async function load(url, headers) {
  const latencies = [];
  let failures = 0;
  const instance = autocannon({ url, connections: CONNECTIONS, duration: DURATION_S, headers });
  instance.on('response', (_client, status, _bytes, ms) => {
    if (status >= 200 && status < 300) latencies.push(ms);
    else failures += 1;
  });
  const result = await instance;
  return { latencies, failures: failures + result.errors + result.timeouts };
}

export async function benchCheckEndpoint() {
  const base = serverUrl();
  const fab = await ApiSession.signIn(base, demoUsers.fabricator);
  const circuit = await fab.demoCircuit('Transmission cooler');
  const { document, draftVersion } = await fab.get(`/circuits/${circuit.id}/draft`);
  const draft = coolerDraft(document, await fab.allParts());
  await fab.saveDraft(circuit.id, draftVersion, draft);
  const evaluation = await fab.get(`/circuits/${circuit.id}/check`);

  const health = await load(`${base}/api/health`, {});
  const check = await load(`${base}/api/circuits/${circuit.id}/check`, fab.authHeader);
  if (health.failures || check.failures) throw new Error(`non-2xx or failed requests: health ${health.failures}, check ${check.failures}`);

  const p = (set, q) => percentile(set.latencies, q);
  const what = `${draft.lines.length} lines, ${evaluation.flags.length} flags; ${CONNECTIONS} connections × ${DURATION_S} s`;
  return [
    row(`api: GET /api/health p50 (${health.latencies.length} requests)`, p(health, 50), 'ms'),
    row('api: GET /api/health p95', p(health, 95), 'ms'),
    row(`api: GET /api/circuits/:id/check p50 (${what}, ${check.latencies.length} requests)`, p(check, 50), 'ms'),
    row('api: GET /api/circuits/:id/check p95', p(check, 95), 'ms'),
    row('api: p95(check) / p95(health)', p(check, 95) / p(health, 95), '×', RATIO_GOAL),
  ];
}
