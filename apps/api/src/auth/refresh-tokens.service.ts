import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { createCipheriv, createDecipheriv, createHash, randomBytes, randomUUID } from 'node:crypto';
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
/**
 * Two tabs (or a retry after a lost response) may present the same token moments apart. Within
 * this window the second gets the successor the first received; after it, reuse means a copy leaked.
 */
export const REFRESH_GRACE_MS = 30_000;

/** Only this digest is stored, so a database leak does not leak usable tokens. */
export function hashRefreshToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** AES-256-GCM key derived from the predecessor token (domain-separated from its stored digest). */
function graceKey(token: string): Buffer {
  return createHash('sha256').update('linesmith refresh grace\u0000', 'utf8').update(token, 'utf8').digest();
}

function sealSuccessor(predecessor: string, successor: string): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv('aes-256-gcm', graceKey(predecessor), iv);
  const body = Buffer.concat([cipher.update(successor, 'utf8'), cipher.final()]);
  return Buffer.concat([iv, cipher.getAuthTag(), body]).toString('base64');
}

function openSuccessor(predecessor: string, sealed: string): string | null {
  try {
    const bytes = Buffer.from(sealed, 'base64');
    const decipher = createDecipheriv('aes-256-gcm', graceKey(predecessor), bytes.subarray(0, 12));
    decipher.setAuthTag(bytes.subarray(12, 28));
    return Buffer.concat([decipher.update(bytes.subarray(28)), decipher.final()]).toString('utf8');
  } catch {
    return null;
  }
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
   * Exchanges a token for its successor. A token exchanged within the last REFRESH_GRACE_MS answers
   * the same successor (while that is still valid); any other reuse of an exchanged or revoked
   * token revokes the whole family: either the user or a thief holds a copy, and we cannot tell which.
   */
  async rotate(token: string, now = new Date()): Promise<RotationOutcome> {
    const tokenHash = hashRefreshToken(token);
    return this.tokens.manager.transaction(async (manager) => {
      // Locked, so concurrent refreshes of one token run one after the other.
      const row = await manager
        .getRepository(RefreshTokenEntity)
        .createQueryBuilder('token')
        .addSelect('token.successorSealed')
        .where('token.token_hash = :tokenHash', { tokenHash })
        .setLock('pessimistic_write')
        .getOne();
      if (!row) return { kind: 'invalid' };
      if (row.replacedBy) {
        const repeated = await this.withinGrace(manager, row, token, now);
        if (repeated) return { kind: 'rotated', userId: row.userId, next: repeated };
      }
      if (row.revokedAt || row.replacedBy) {
        await this.revokeFamilyWith(manager, row.familyId);
        return { kind: 'reused' };
      }
      if (row.expiresAt.getTime() <= now.getTime()) return { kind: 'invalid' };
      const { id, issued } = await this.insert(manager, row.userId, row.familyId);
      await manager.update(
        RefreshTokenEntity,
        { id: row.id },
        { revokedAt: now, replacedBy: id, successorSealed: sealSuccessor(token, issued.token) },
      );
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

  /** The successor handed out for this token moments ago, if the window is open and it is still live. */
  private async withinGrace(manager: EntityManager, row: RefreshTokenEntity, token: string, now: Date): Promise<IssuedRefreshToken | null> {
    if (!row.revokedAt || !row.successorSealed || now.getTime() - row.revokedAt.getTime() > REFRESH_GRACE_MS) return null;
    const successor = await manager.findOneBy(RefreshTokenEntity, { id: row.replacedBy!, revokedAt: IsNull() });
    if (!successor || successor.expiresAt.getTime() <= now.getTime()) return null;
    const plain = openSuccessor(token, row.successorSealed);
    if (!plain || hashRefreshToken(plain) !== successor.tokenHash) return null;
    return { token: plain, expiresAt: successor.expiresAt, familyId: successor.familyId };
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
