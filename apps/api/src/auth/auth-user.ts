import type { Role } from '../users/role.js';

/**
 * Who is calling. Only the user and session ids come from the access token; shop, roles and
 * whether the session is still open are read from the database on every request.
 */
export interface AuthUser {
  userId: string;
  shopId: string;
  roles: Role[];
  /** The sign-in session (refresh-token family) the access token was issued for. */
  sessionId: string;
}

/** Claims we put in access tokens; iss, aud, iat and exp are added when signing. */
export interface AccessTokenClaims {
  sub: string;
  sid: string;
}
