import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { createHash, randomBytes } from 'node:crypto';
import { IsNull, MoreThan, type EntityManager, type Repository } from 'typeorm';
import { ValidationError } from '../common/errors/app-error.js';
import { UserTokenEntity, type UserTokenPurpose } from './user-token.entity.js';

const DAY_MS = 24 * 60 * 60 * 1000;

/** How long a link stays valid: an invitation a week, a reset an hour. */
export const TOKEN_LIFETIME_MS: Record<UserTokenPurpose, number> = { invite: 7 * DAY_MS, reset: 60 * 60 * 1000 };

function digest(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** One-time link tokens for invitations and password resets. */
@Injectable()
export class UserTokensService {
  constructor(@InjectRepository(UserTokenEntity) private readonly tokens: Repository<UserTokenEntity>) {}

  /** A fresh token (256 random bits); earlier unused tokens of the same purpose stop working. */
  async issue(userId: string, purpose: UserTokenPurpose, now = new Date()): Promise<string> {
    const token = randomBytes(32).toString('base64url');
    await this.tokens.update({ userId, purpose, usedAt: IsNull() }, { usedAt: now });
    await this.tokens.save(
      this.tokens.create({ userId, purpose, tokenHash: digest(token), expiresAt: new Date(now.getTime() + TOKEN_LIFETIME_MS[purpose]), usedAt: null }),
    );
    return token;
  }

  /** How many tokens of this purpose the user was sent since `since` (for the reset rate limit). */
  countIssuedSince(userId: string, purpose: UserTokenPurpose, since: Date): Promise<number> {
    return this.tokens.countBy({ userId, purpose, createdAt: MoreThan(since) });
  }

  /**
   * Marks the token used and answers its user id, inside the caller's transaction; an unknown,
   * used or expired token answers 400 (all alike, so the answer reveals nothing).
   */
  async consume(manager: EntityManager, token: string, purpose: UserTokenPurpose, now = new Date()): Promise<string> {
    const row = await manager
      .getRepository(UserTokenEntity)
      .createQueryBuilder('token')
      .where('token.token_hash = :hash AND token.purpose = :purpose', { hash: digest(token), purpose })
      .setLock('pessimistic_write')
      .getOne();
    if (!row || row.usedAt || row.expiresAt <= now) {
      throw new ValidationError([{ path: 'token', message: 'This link is not valid any more. Ask for a new one.' }], 'This link is not valid any more.');
    }
    await manager.getRepository(UserTokenEntity).update({ id: row.id }, { usedAt: now });
    return row.userId;
  }
}
