import { hoseEndFitsHose, partSchema, solveAdapters, type HosePart, type Part } from '@linesmith/catalog';
import {
  circuitDocumentSchema,
  shopRulesSchema,
  type CircuitDocument,
  type CircuitDocumentInput,
  type CircuitPort,
  type ShopRules,
} from '@linesmith/routing';
import { baseUrl, demoPassword } from './browser';

// Set-up through the API for what a journey is not about, so each journey file makes its own data
// and none depends on another file's changes to the demo shop.

export interface ApiSession {
  token: string;
  user: { id: string; displayName: string; roles: string[] };
}

const sessions = new Map<string, Promise<ApiSession>>();

/** Signs in once per user and file (the access token outlives a journey). */
export function apiSignIn(email: string, password = demoPassword): Promise<ApiSession> {
  const key = `${email}\n${password}`;
  const session = sessions.get(key) ?? signInNow(email, password);
  sessions.set(key, session);
  session.catch(() => sessions.delete(key));
  return session;
}

async function signInNow(email: string, password: string): Promise<ApiSession> {
  const res = await fetch(`${baseUrl}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (!res.ok) throw new Error(`sign-in as ${email}: ${res.status} ${await res.text()}`);
  const body = (await res.json()) as { accessToken: string; user: ApiSession['user'] };
  return { token: body.accessToken, user: body.user };
}

export async function api<T>(
  session: ApiSession,
  method: string,
  path: string,
  body?: unknown,
  headers: Record<string, string> = {},
): Promise<T> {
  const res = await fetch(`${baseUrl}/api${path}`, {
    method,
    headers: {
      authorization: `Bearer ${session.token}`,
      ...(body === undefined ? {} : { 'content-type': 'application/json' }),
      ...headers,
    },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${await res.text()}`);
  return (res.status === 204 ? undefined : await res.json()) as T;
}

/** Every part of the shop's catalogue (the list is paged at 200 at most). */
export async function catalogue(session: ApiSession): Promise<Part[]> {
  const parts: Part[] = [];
  for (let page = 1; ; page++) {
    const body = await api<{ items: unknown[] }>(session, 'GET', `/parts?pageSize=200&page=${page}&includeRetired=true`);
    parts.push(...body.items.map((item) => partSchema.parse(item)));
    if (body.items.length < 200) return parts;
  }
}

export async function shopRules(session: ApiSession): Promise<ShopRules> {
  return shopRulesSchema.parse((await api<{ rules: unknown }>(session, 'GET', '/shop-rules')).rules);
}

/** The seeded demo pickup (PRODUCT.md "Demo scenario"). */
export async function demoBuildId(session: ApiSession): Promise<string> {
  const { items } = await api<{ items: Array<{ id: string; vehicle: { make: string } }> }>(session, 'GET', '/builds?pageSize=100');
  const build = items.find((b) => b.vehicle.make === 'Redfern');
  if (!build) throw new Error('the demo build is missing');
  return build.id;
}

export interface CircuitRef {
  id: string;
  name: string;
  buildId: string;
}

/** A fresh circuit on the demo build whose draft is a copy of the named demo circuit's starter sketch. */
export async function copyOfDemoCircuit(session: ApiSession, demoName: string, name: string): Promise<CircuitRef> {
  const buildId = await demoBuildId(session);
  const circuits = await api<Array<{ id: string; name: string; kind: string }>>(session, 'GET', `/builds/${buildId}/circuits`);
  const demo = circuits.find((c) => c.name === demoName);
  if (!demo) throw new Error(`the demo circuit "${demoName}" is missing`);
  const circuit = await api<{ id: string }>(session, 'POST', `/builds/${buildId}/circuits`, { kind: demo.kind, name });
  const { document } = await api<{ document: CircuitDocument }>(session, 'GET', `/circuits/${demo.id}/draft`);
  await saveDraft(session, circuit.id, { ...document, lines: [], calibration: null, background: null });
  return { id: circuit.id, name, buildId };
}

export async function saveDraft(session: ApiSession, circuitId: string, document: CircuitDocumentInput): Promise<void> {
  const { draftVersion } = await api<{ draftVersion: number }>(session, 'GET', `/circuits/${circuitId}/draft`);
  await api(session, 'PUT', `/circuits/${circuitId}/draft`, circuitDocumentSchema.parse(document), {
    'if-match': String(draftVersion),
  });
}

/** The first end stack the adapter solver finds from `port` to a hose end that fits `hose`, honouring the port's requirement. */
function endStack(port: CircuitPort, hose: HosePart, parts: readonly Part[]): string[] {
  for (const end of parts) {
    if (end.kind !== 'hose-end' || end.retired || !hoseEndFitsHose(end, hose)) continue;
    const options = port.requirement ? { limit: 1, requirement: port.requirement } : { limit: 1 };
    const [chain] = solveAdapters(port.connection, end.attributes.port, parts, options);
    if (chain && (!port.requirement || chain.partCount > 0)) return [...chain.parts.map((p) => p.id), end.id];
  }
  throw new Error(`no end stack joins port "${port.id}" to ${hose.description}`);
}

/**
 * The demo transmission-cooler sketch, calibrated (20 px per inch), with one line from the
 * transmission's return port over two corners to the cooler's outlet: the hose and both end stacks
 * as a fabricator picks them from the suggestions (long-nose fitting in the lubrication port).
 */
export async function sketchTransmissionCoolerLine(session: ApiSession, circuitId: string): Promise<CircuitDocument> {
  const [{ document }, parts] = await Promise.all([
    api<{ document: CircuitDocument }>(session, 'GET', `/circuits/${circuitId}/draft`),
    catalogue(session),
  ]);
  const hose = parts.find((p): p is HosePart => p.kind === 'hose' && p.description === '-6 CPE-lined braided rubber hose');
  if (!hose) throw new Error('the demo catalogue has no -6 CPE-lined braided rubber hose');
  const port = (unitId: string, portId: string): CircuitPort => {
    const found = document.units.find((u) => u.id === unitId)?.ports.find((p) => p.id === portId);
    if (!found) throw new Error(`no port ${unitId}/${portId} in the demo sketch`);
    return found;
  };
  const next = circuitDocumentSchema.parse({
    ...document,
    calibration: { a: { x: 300, y: 100 }, b: { x: 500, y: 100 }, knownIn: 10 },
    lines: [
      {
        id: 'setup-line-1',
        from: { unitId: 'transmission', portId: 'cooler-return' },
        to: { unitId: 'cooler', portId: 'out' },
        hosePartId: hose.id,
        // Each corner far enough from its port that the bend starts past the rigid end stack
        // (adapters + hose-end socket, about 3-3/4 in and 3-1/8 in here).
        points: [
          { x: 540, y: 444, bendRadiusIn: 3 },
          { x: 450, y: 180, bendRadiusIn: 3 },
        ],
        endStacks: {
          from: endStack(port('transmission', 'cooler-return'), hose, parts),
          to: endStack(port('cooler', 'out'), hose, parts),
        },
        supports: [],
        sleeves: [],
      },
    ],
  });
  await saveDraft(session, circuitId, next);
  return next;
}

/** Fabricator: a new transmission-cooler circuit with its line drawn and parts picked, submitted for review. */
export async function submittedCircuit(fabricator: ApiSession, name: string): Promise<CircuitRef> {
  const circuit = await copyOfDemoCircuit(fabricator, 'Transmission cooler', name);
  await sketchTransmissionCoolerLine(fabricator, circuit.id);
  await api(fabricator, 'POST', `/circuits/${circuit.id}/submit`, { message: 'Line drawn and parts picked; ready for review.' });
  return circuit;
}

interface ReviewOpenItems {
  openItems: { blockers: Array<{ key: string }>; unacknowledgedCautions: Array<{ key: string }> };
}

/** Reviewer: acknowledges every caution of the submitted revision and approves it. */
export async function approve(reviewer: ApiSession, circuitId: string): Promise<void> {
  const review = await api<ReviewOpenItems>(reviewer, 'GET', `/circuits/${circuitId}/review`);
  if (review.openItems.blockers.length > 0) throw new Error(`the set-up circuit has blockers: ${JSON.stringify(review.openItems.blockers)}`);
  // Two flags of one rule on one line share a key (e.g. two narrow fittings): one acknowledgement covers both.
  for (const key of new Set(review.openItems.unacknowledgedCautions.map((caution) => caution.key))) {
    await api(reviewer, 'POST', `/circuits/${circuitId}/review/acknowledgements`, {
      flagKey: key,
      note: 'Acceptable for this build (set-up).',
    });
  }
  await api(reviewer, 'POST', `/circuits/${circuitId}/review/approve`, { note: '' });
}

/** The hose and end-stack parts a circuit's draft names. */
export async function partIdsOfDraft(session: ApiSession, circuitId: string): Promise<string[]> {
  const { document } = await api<{ document: CircuitDocument }>(session, 'GET', `/circuits/${circuitId}/draft`);
  const ids = document.lines.flatMap((line) => [line.hosePartId, ...line.endStacks.from, ...line.endStacks.to]);
  return [...new Set(ids.filter((id): id is string => id !== null))];
}

/** Parts clerk: books each part's stock down to zero, so an order for them has something to order. */
export async function useUpStock(clerk: ApiSession, partIds: readonly string[]): Promise<void> {
  for (const id of partIds) {
    const { stockOnHand } = await api<{ stockOnHand: number }>(clerk, 'GET', `/parts/${id}`);
    if (stockOnHand <= 0) continue;
    await api(clerk, 'POST', `/parts/${id}/stock-adjustments`, { delta: -stockOnHand, reason: 'Shelf count: none left.' });
  }
}

/** A short, unique suffix so names made by repeated runs against the same database stay apart. */
export const runTag = (): string => `${Date.now().toString(36).slice(-5)}${Math.random().toString(36).slice(2, 4)}`;
