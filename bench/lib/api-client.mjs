// A small JSON client for the Linesmith API, used by the bench suites and the soak to set up data
// the way a user would: through the public endpoints, signed in as a demo user.

export const demoPassword = 'linesmith-demo';
export const demoUsers = {
  admin: 'owner@tidewater.example',
  fabricator: 'fab@tidewater.example',
  partsClerk: 'parts@tidewater.example',
};

/** The server the suites talk to; `scripts/bench.sh` and `scripts/soak.sh` set it. */
export function serverUrl() {
  const url = process.env.LINESMITH_URL;
  if (!url) throw new Error('LINESMITH_URL is not set: run through `npm run bench` (or start the server and set it)');
  return url.replace(/\/$/, '');
}

export class ApiError extends Error {
  constructor(method, path, status, body) {
    super(`${method} ${path} answered ${status}: ${JSON.stringify(body).slice(0, 300)}`);
    this.status = status;
    this.body = body;
  }
}

/** A signed-in session: `get`, `post`, `put` resolve with the parsed body or throw ApiError. */
export class ApiSession {
  constructor(baseUrl, accessToken) {
    this.baseUrl = baseUrl;
    this.accessToken = accessToken;
  }

  static async signIn(baseUrl, email, password = demoPassword) {
    const response = await fetch(`${baseUrl}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email, password }),
    });
    const body = await response.json();
    if (!response.ok) throw new ApiError('POST', '/api/auth/login', response.status, body);
    return new ApiSession(baseUrl, body.accessToken);
  }

  get authHeader() {
    return { authorization: `Bearer ${this.accessToken}` };
  }

  async request(method, path, body, headers = {}) {
    const response = await fetch(`${this.baseUrl}/api${path}`, {
      method,
      headers: { ...this.authHeader, ...(body === undefined ? {} : { 'content-type': 'application/json' }), ...headers },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await response.text();
    const parsed = text ? JSON.parse(text) : undefined;
    if (!response.ok) throw new ApiError(method, path, response.status, parsed);
    return parsed;
  }

  get(path) {
    return this.request('GET', path);
  }

  post(path, body) {
    return this.request('POST', path, body);
  }

  /** Saves a circuit's draft over `draftVersion`; resolves with the new draft version. */
  async saveDraft(circuitId, draftVersion, document) {
    const saved = await this.request('PUT', `/circuits/${circuitId}/draft`, document, { 'if-match': `"${draftVersion}"` });
    return saved.draftVersion;
  }

  /** Every active part of the shop's catalogue (paged by 200). */
  async allParts() {
    const parts = [];
    for (let page = 1; ; page += 1) {
      const result = await this.get(`/parts?pageSize=200&page=${page}`);
      parts.push(...result.items);
      if (result.items.length < 200) return parts;
    }
  }

  /** The demo pickup's circuit of that name (seeded by `migrate_and_seed`). */
  async demoCircuit(name) {
    const builds = await this.get('/builds?pageSize=100');
    for (const build of builds.items) {
      const circuits = await this.get(`/builds/${build.id}/circuits`);
      const found = circuits.find((circuit) => circuit.name === name);
      if (found) return found;
    }
    throw new Error(`No circuit named "${name}": is the demo shop seeded?`);
  }
}
