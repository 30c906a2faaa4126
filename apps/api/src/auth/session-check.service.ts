import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import type { Role } from '../users/role.js';
import type { AuthUser } from './auth-user.js';

/** The part of pg's Pool we use (TypeORM's postgres driver keeps one as `master`). */
interface PgPool {
  query<R>(query: { name: string; text: string; values: unknown[] }): Promise<{ rows: R[] }>;
}

const SESSION_CHECK_SQL = `
  SELECT u.shop_id AS "shopId", u.roles AS "roles"
    FROM users u
   WHERE u.id = $1 AND u.active
     AND EXISTS (SELECT 1 FROM refresh_tokens r
                  WHERE r.family_id = $2 AND r.user_id = u.id AND r.revoked_at IS NULL AND r.expires_at > now())`;

/**
 * The per-request half of authentication: a signature proves who was signed in, not that they
 * still may be. One indexed query answers the user's shop and roles now, and whether the session
 * the token belongs to is still open (not signed out, not ended by a password reset, role change
 * or deactivation).
 */
@Injectable()
export class SessionCheckService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async caller(userId: string, sessionId: string): Promise<AuthUser | null> {
    // Straight on TypeORM's pg pool as a named (prepared once per connection) statement: it runs on
    // every signed-in request, so it skips the query-runner set-up and the planner.
    const pool = (this.dataSource.driver as unknown as { master: PgPool }).master;
    const { rows } = await pool.query<{ shopId: string; roles: Role[] }>({ name: 'linesmith-session-check', text: SESSION_CHECK_SQL, values: [userId, sessionId] });
    const row = rows[0];
    return row ? { userId, shopId: row.shopId, roles: row.roles, sessionId } : null;
  }
}

/**
 * Ends every session of a user at once: their refresh tokens stop working and, through the check
 * above, so do their access tokens on the next request. Runs inside the caller's transaction.
 */
export async function endAllSessions(manager: EntityManager, userId: string): Promise<void> {
  await manager.query(`UPDATE refresh_tokens SET revoked_at = now(), updated_at = now() WHERE user_id = $1 AND revoked_at IS NULL`, [userId]);
}
