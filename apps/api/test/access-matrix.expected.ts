import type { Role } from '../src/users/role.js';

/**
 * Who may call which API route: the expected outcome of every route (as Express registered it)
 * for one user of each role in the owning shop, a user of another shop (holding every role, so only
 * the shop boundary can stop them) and a caller without a token. access-matrix.e2e-spec.ts calls
 * every route as each of them and compares.
 *
 * - allowed: 2xx, or a 4xx other than 401/403/404 (400 for a minimal body, 409 for a stale
 *   version or a state the record is not in) — the caller got past authentication and roles.
 * - forbidden: 403.  - unauthenticated: 401.
 * - not-found-for-other-shop: 404, because the id in the path belongs to another shop.
 * - not-found: 404 for everybody (the answer to unknown API paths).
 */
export type Outcome = 'allowed' | 'forbidden' | 'unauthenticated' | 'not-found-for-other-shop' | 'not-found';
export type Caller = Role | 'other-shop' | 'anonymous';
export const CALLERS: readonly Caller[] = ['anonymous', 'other-shop', 'reviewer', 'parts-clerk', 'fabricator', 'admin'];

export interface RouteExpectation {
  outcomes: Record<Caller, Outcome>;
  /**
   * The request the test sends passes validation and the service, so the first allowed caller
   * must get a 2xx (later ones may meet a 409, e.g. a version already used).
   */
  succeeds: boolean;
}

interface Options {
  /** The path (or the body) names a record of the owning shop: another shop's user must get 404. */
  ownedId?: boolean;
  succeeds?: boolean;
}

function expectation(allowedRoles: readonly Role[] | 'all', options: Options): RouteExpectation {
  const roleOutcome = (role: Role): Outcome => (allowedRoles === 'all' || allowedRoles.includes(role) ? 'allowed' : 'forbidden');
  return {
    outcomes: {
      anonymous: 'unauthenticated',
      'other-shop': options.ownedId ? 'not-found-for-other-shop' : 'allowed',
      reviewer: roleOutcome('reviewer'),
      'parts-clerk': roleOutcome('parts-clerk'),
      fabricator: roleOutcome('fabricator'),
      admin: roleOutcome('admin'),
    },
    succeeds: options.succeeds ?? false,
  };
}

/** Any signed-in user of the shop. */
const signedIn = (options: Options = {}) => expectation('all', options);
/** Only users holding one of `roles`. */
const only = (roles: readonly Role[], options: Options = {}) => expectation(roles, options);
/** No token needed; every caller gets the same outcome. */
const open = (outcome: Outcome, succeeds: boolean): RouteExpectation => ({
  outcomes: { anonymous: outcome, 'other-shop': outcome, reviewer: outcome, 'parts-clerk': outcome, fabricator: outcome, admin: outcome },
  succeeds,
});

const makers = ['fabricator', 'admin'] as const;
const stockKeepers = ['admin', 'parts-clerk'] as const;
const reviewers = ['reviewer', 'admin'] as const;
const admins = ['admin'] as const;

export const EXPECTED_ACCESS: Record<string, RouteExpectation> = {
  'GET /api/health': open('allowed', true),
  'GET /api/docs': open('allowed', true),
  'GET /api/docs-json': open('allowed', true),
  'GET /api/docs-yaml': open('allowed', true),
  // The API docs page and its assets are public.
  'GET /api/docs/': open('allowed', true),
  'GET /api/docs/index.html': open('allowed', true),
  'GET /api/docs/swagger-ui-init.js': open('allowed', true),
  'GET /api/docs/docs/swagger-ui-init.js': open('allowed', true),
  // Registered by the docs module, but the file is not shipped with it.
  'GET /api/docs/LICENSE': open('not-found', false),
  // Any other path under /api answers 404 in the error shape, before authentication.
  'ALL /api{/*splat}': open('not-found', false),

  // Public sign-in routes: an empty body is refused by validation for everybody.
  'POST /api/auth/login': open('allowed', false),
  // Refresh authenticates by the refresh cookie alone; a bearer token does not count.
  'POST /api/auth/refresh': open('unauthenticated', false),
  'POST /api/auth/logout': open('allowed', true),
  'POST /api/auth/accept-invite': open('allowed', false),
  'POST /api/auth/request-reset': open('allowed', false),
  'POST /api/auth/reset-password': open('allowed', false),

  'GET /api/me': signedIn({ succeeds: true }),
  'GET /api/users': only(admins, { succeeds: true }),
  'POST /api/users': only(admins),
  'PATCH /api/users/:id': only(admins, { ownedId: true, succeeds: true }),
  'POST /api/users/invite': only(admins),
  'GET /api/outbox': only(admins, { succeeds: true }),

  'GET /api/shop': signedIn({ succeeds: true }),
  'PATCH /api/shop': only(admins, { succeeds: true }),
  'GET /api/shop-rules': signedIn({ succeeds: true }),
  'PUT /api/shop-rules': only(admins),

  'GET /api/builds': signedIn({ succeeds: true }),
  'POST /api/builds': only(makers, { succeeds: true }),
  'GET /api/builds/:id': signedIn({ ownedId: true, succeeds: true }),
  'PATCH /api/builds/:id': only(makers, { ownedId: true, succeeds: true }),
  'GET /api/builds/:buildId/circuits': signedIn({ ownedId: true, succeeds: true }),
  'POST /api/builds/:buildId/circuits': only(makers, { ownedId: true, succeeds: true }),
  'GET /api/builds/:buildId/uploads': signedIn({ ownedId: true, succeeds: true }),
  'POST /api/builds/:buildId/uploads': only(makers, { ownedId: true, succeeds: true }),
  'GET /api/uploads/:id/content': signedIn({ ownedId: true, succeeds: true }),
  'DELETE /api/uploads/:id': only(makers, { ownedId: true, succeeds: true }),

  'GET /api/circuits/:id': signedIn({ ownedId: true, succeeds: true }),
  'PATCH /api/circuits/:id': only(makers, { ownedId: true, succeeds: true }),
  'DELETE /api/circuits/:id': only(makers, { ownedId: true, succeeds: true }),
  'GET /api/circuits/:id/draft': signedIn({ ownedId: true, succeeds: true }),
  'PUT /api/circuits/:id/draft': only(makers, { ownedId: true, succeeds: true }),
  'GET /api/circuits/:id/revisions': signedIn({ ownedId: true, succeeds: true }),
  'GET /api/circuits/:id/revisions/:number': signedIn({ ownedId: true, succeeds: true }),
  'POST /api/circuits/:id/revisions': only(makers, { ownedId: true, succeeds: true }),
  'GET /api/circuits/:id/check': signedIn({ ownedId: true, succeeds: true }),
  'GET /api/circuits/:id/audit': signedIn({ ownedId: true, succeeds: true }),
  'GET /api/circuits/:id/cut-list.xlsx': signedIn({ ownedId: true, succeeds: true }),
  'POST /api/circuits/:id/submit': only(makers, { ownedId: true, succeeds: true }),
  'GET /api/circuits/:id/review': signedIn({ ownedId: true, succeeds: true }),
  'POST /api/circuits/:id/review/acknowledgements': only(reviewers, { ownedId: true }),
  'POST /api/circuits/:id/review/approve': only(reviewers, { ownedId: true }),
  'POST /api/circuits/:id/review/return': only(reviewers, { ownedId: true }),
  'GET /api/circuits/:id/compare': signedIn({ ownedId: true, succeeds: true }),
  'GET /api/reviews': only(reviewers, { succeeds: true }),

  'POST /api/rules/evaluate': signedIn({ succeeds: true }),
  'GET /api/reference/families': signedIn({ succeeds: true }),
  'GET /api/reference/threads': signedIn({ succeeds: true }),
  'POST /api/reference/identify': signedIn(),
  'POST /api/reference/mate': signedIn(),
  'POST /api/reference/adapters': signedIn(),
  'GET /api/reference/rules': signedIn({ succeeds: true }),

  'GET /api/parts': signedIn({ succeeds: true }),
  'POST /api/parts': only(stockKeepers, { succeeds: true }),
  'GET /api/parts/:id': signedIn({ ownedId: true, succeeds: true }),
  'PATCH /api/parts/:id': only(stockKeepers, { ownedId: true, succeeds: true }),
  'DELETE /api/parts/:id': only(stockKeepers, { ownedId: true, succeeds: true }),
  'GET /api/parts/:id/stock-adjustments': signedIn({ ownedId: true, succeeds: true }),
  'POST /api/parts/:id/stock-adjustments': only(stockKeepers, { ownedId: true, succeeds: true }),
  'GET /api/suppliers': signedIn({ succeeds: true }),
  'POST /api/suppliers': only(stockKeepers, { succeeds: true }),
  'PATCH /api/suppliers/:id': only(stockKeepers, { ownedId: true, succeeds: true }),
  'POST /api/price-lists/preview': only(stockKeepers),
  'POST /api/price-lists/commit': only(stockKeepers),

  'POST /api/orders/draft': only(stockKeepers, { ownedId: true, succeeds: true }),
  'GET /api/orders': only(stockKeepers, { succeeds: true }),
  'GET /api/orders/:id': only(stockKeepers, { ownedId: true, succeeds: true }),
  'GET /api/orders/:id/export.xlsx': only(stockKeepers, { ownedId: true, succeeds: true }),
  'POST /api/orders/:id/send': only(stockKeepers, { ownedId: true, succeeds: true }),
  'POST /api/orders/:id/receive': only(stockKeepers, { ownedId: true }),
};
