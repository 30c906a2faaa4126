import { CreateShopsUsersRefreshTokens1764650000000 } from './1764650000000-create-shops-users-refresh-tokens.js';

/** Every migration in order of its timestamp; add new ones at the end. */
export const MIGRATIONS = [CreateShopsUsersRefreshTokens1764650000000];
