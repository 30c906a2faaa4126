import { Injectable, type OnModuleInit } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import type { DataSource } from 'typeorm';
import { RateLimitedError } from '../common/errors/app-error.js';
import { AppConfigService } from '../config/app-config.service.js';

const MINUTE_SEC = 60;
/** Failed sign-ins per account before it is locked for the window (OWASP Authentication Cheat Sheet, "Account Lockout"). */
const ACCOUNT_WINDOW_SEC = 15 * MINUTE_SEC;

/**
 * Sign-in and account-link limits kept in PostgreSQL (rate-limiter-flexible's store, table
 * `rate_limits`), so every API process behind a load balancer counts against the same allowance.
 * Client addresses are Express's `req.ip`, which honours X-Forwarded-For only from the proxies
 * named in TRUST_PROXY.
 */
@Injectable()
export class AbuseLimitsService implements OnModuleInit {
  private perClient!: RateLimiterPostgres;
  private perAccount!: RateLimiterPostgres;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly config: AppConfigService,
  ) {}

  onModuleInit(): void {
    // TypeORM's postgres driver keeps its pg Pool as `master`.
    const pool = (this.dataSource.driver as unknown as { master: unknown }).master;
    const common = { storeClient: pool, storeType: 'pool', tableName: 'rate_limits', tableCreated: true, clearExpiredByTimeout: false };
    this.perClient = new RateLimiterPostgres({ ...common, keyPrefix: 'client', points: this.config.get('LOGIN_RATE_LIMIT'), duration: MINUTE_SEC });
    this.perAccount = new RateLimiterPostgres({
      ...common,
      keyPrefix: 'account',
      points: this.config.get('LOGIN_ACCOUNT_LIMIT'),
      duration: ACCOUNT_WINDOW_SEC,
    });
  }

  /** One attempt of a public auth route (`action`) from a client address. */
  async consumeClient(action: string, clientAddress: string): Promise<void> {
    await this.consume(this.perClient, `${action}:${clientAddress}`, 'Too many attempts from this address. Please wait a minute and try again.');
  }

  /**
   * One sign-in attempt for an e-mail address, known or not (so the limit reveals nothing).
   * A successful sign-in clears the count.
   */
  async consumeAccount(email: string): Promise<void> {
    await this.consume(
      this.perAccount,
      email.trim().toLowerCase(),
      'Too many failed sign-ins for this account. Wait 15 minutes, or reset the password by e-mail.',
    );
  }

  async clearAccount(email: string): Promise<void> {
    await this.perAccount.delete(email.trim().toLowerCase());
  }

  private async consume(limiter: RateLimiterPostgres, key: string, message: string): Promise<void> {
    try {
      await limiter.consume(key);
    } catch (outcome) {
      if (outcome instanceof RateLimiterRes) throw new RateLimitedError(message, Math.max(1, Math.ceil(outcome.msBeforeNext / 1000)));
      throw outcome;
    }
  }
}
