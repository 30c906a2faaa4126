import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { createHash, randomBytes, randomUUID } from 'node:crypto';
import { IsNull, type EntityManager, type Repository } from 'typeorm';
import { AppConfigService } from '../config/app-config.service.js';
import { RefreshTokenEntity } from './refresh-token.entity.js';

export interface IssuedRefreshToken {
  token: string;
  expiresAt: Date;
  familyId: string;
}

export type RotationOutcome =
  | { kind: 'rotated'; userId: string; next: IssuedRefreshToken }
  | { kind: 'reused' }
  | { kind: 'invalid' };

const DAY_MS = 24 * 60 * 60 * 1000;

/** Only this digest is stored, so a database leak does not leak usable tokens. */
export function hashRefreshToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

@Injectable()
export class RefreshTokensService {
  constructor(
    @InjectRepository(RefreshTokenEntity) private readonly tokens: Repository<RefreshTokenEntity>,
    private readonly config: AppConfigService,
  ) {}

  /** Starts a new family (a sign-in) or continues one (a refresh). */
  async issue(userId: string, familyId: string = randomUUID()): Promise<IssuedRefreshToken> {
    const { issued } = await this.insert(this.tokens.manager, userId, familyId);
    return issued;
  }

  /**
   * Exchanges a token for its successor. A token that was already exchanged (or revoked) revokes its
   * whole family: either the user or a thief holds a copy, and we cannot tell which.
   */
  async rotate(token: string): Promise<RotationOutcome> {
    const tokenHash = hashRefreshToken(token);
    return this.tokens.manager.transaction(async (manager) => {
      const row = await manager.findOne(RefreshTokenEntity, {
        where: { tokenHash },
        lock: { mode: 'pessimistic_write' },
      });
      if (!row) return { kind: 'invalid' };
      if (row.revokedAt || row.replacedBy) {
        await this.revokeFamilyWith(manager, row.familyId);
        return { kind: 'reused' };
      }
      if (row.expiresAt.getTime() <= Date.now()) return { kind: 'invalid' };
      const { id, issued } = await this.insert(manager, row.userId, row.familyId);
      await manager.update(RefreshTokenEntity, { id: row.id }, { revokedAt: new Date(), replacedBy: id });
      return { kind: 'rotated', userId: row.userId, next: issued };
    });
  }

  /** Ends the session the token belongs to (sign-out); unknown tokens are ignored. */
  async revokeFamilyOf(token: string): Promise<void> {
    const row = await this.tokens.findOneBy({ tokenHash: hashRefreshToken(token) });
    if (row) await this.revokeFamily(row.familyId);
  }

  revokeFamily(familyId: string): Promise<void> {
    return this.revokeFamilyWith(this.tokens.manager, familyId);
  }

  private async revokeFamilyWith(manager: EntityManager, familyId: string): Promise<void> {
    await manager.update(RefreshTokenEntity, { familyId, revokedAt: IsNull() }, { revokedAt: new Date() });
  }

  private async insert(
    manager: EntityManager,
    userId: string,
    familyId: string,
  ): Promise<{ id: string; issued: IssuedRefreshToken }> {
    const token = randomBytes(32).toString('base64url');
    const expiresAt = new Date(Date.now() + this.config.get('REFRESH_TTL_DAYS') * DAY_MS);
    const result = await manager.insert(RefreshTokenEntity, {
      userId,
      familyId,
      tokenHash: hashRefreshToken(token),
      expiresAt,
    });
    const id = (result.identifiers[0] as { id: string }).id;
    return { id, issued: { token, expiresAt, familyId } };
  }
}
