import type { Role } from '../users/role.js';

/** Who is calling, taken from the verified access token. */
export interface AuthUser {
  userId: string;
  shopId: string;
  roles: Role[];
}

/** Claims of our access tokens. */
export interface AccessTokenClaims {
  sub: string;
  shopId: string;
  roles: Role[];
}
