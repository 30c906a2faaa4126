import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import type { Role } from '../users/role.js';
import type { AuthUser } from './auth-user.js';

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
    const rows = (await this.dataSource.query(
      `SELECT u.shop_id AS "shopId", u.roles AS "roles"
         FROM users u
        WHERE u.id = $1 AND u.active
          AND EXISTS (SELECT 1 FROM refresh_tokens r
                       WHERE r.family_id = $2 AND r.user_id = u.id AND r.revoked_at IS NULL AND r.expires_at > now())`,
      [userId, sessionId],
    )) as Array<{ shopId: string; roles: Role[] }>;
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
