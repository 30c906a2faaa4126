import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { AppError, UnauthorizedError } from '../common/errors/app-error.js';
import { ErrorCode } from '../common/errors/error-code.js';
import { AppConfigService } from '../config/app-config.service.js';
import { ShopsService } from '../shops/shops.service.js';
import { burnPasswordCheck, verifyPassword } from '../users/password.js';
import type { UserEntity } from '../users/user.entity.js';
import { UsersService } from '../users/users.service.js';
import type { AccessTokenClaims } from './auth-user.js';
import type { Me, SessionResponse } from './dto/auth.schemas.js';
import { AbuseLimitsService } from './abuse-limits.service.js';
import { RefreshTokensService, type IssuedRefreshToken } from './refresh-tokens.service.js';

export interface Session extends SessionResponse {
  refresh: IssuedRefreshToken;
}

@Injectable()
export class AuthService {
  constructor(
    private readonly users: UsersService,
    private readonly shops: ShopsService,
    private readonly refreshTokens: RefreshTokensService,
    private readonly jwt: JwtService,
    private readonly config: AppConfigService,
    private readonly limits: AbuseLimitsService,
  ) {}

  /** Wrong e-mail, wrong password, no password yet and deactivated all answer the same. */
  async login(email: string, password: string): Promise<Session> {
    // Counted before the password is checked, for known and unknown addresses alike.
    await this.limits.consumeAccount(email);
    const user = await this.users.findForSignIn(email);
    if (!user?.passwordHash) {
      await burnPasswordCheck(password);
      throw this.invalidCredentials();
    }
    const passwordOk = await verifyPassword(user.passwordHash, password);
    if (!passwordOk || !user.active) throw this.invalidCredentials();
    await this.limits.clearAccount(email);
    return this.startSession(user, await this.refreshTokens.issue(user.id));
  }

  async refresh(token: string | undefined): Promise<Session> {
    if (!token) throw new UnauthorizedError('Your session has ended. Please sign in.');
    const outcome = await this.refreshTokens.rotate(token);
    if (outcome.kind !== 'rotated') throw new UnauthorizedError('Your session has ended. Please sign in.');
    const user = await this.users.findActive(outcome.userId);
    if (!user) {
      await this.refreshTokens.revokeFamily(outcome.next.familyId);
      throw new UnauthorizedError('Your session has ended. Please sign in.');
    }
    return this.startSession(user, outcome.next);
  }

  async logout(token: string | undefined): Promise<void> {
    if (token) await this.refreshTokens.revokeFamilyOf(token);
  }

  async me(shopId: string, userId: string): Promise<Me> {
    const user = await this.users.getOwn(shopId, userId);
    return this.toMe(user);
  }

  /** Signs in a user whose identity was proven another way (an invitation or reset link). */
  async sessionFor(user: UserEntity): Promise<Session> {
    return this.startSession(user, await this.refreshTokens.issue(user.id));
  }

  private async startSession(user: UserEntity, refresh: IssuedRefreshToken): Promise<Session> {
    const claims: AccessTokenClaims = { sub: user.id, sid: refresh.familyId };
    const accessToken = await this.jwt.signAsync(claims);
    return { accessToken, expiresInSec: this.config.get('JWT_ACCESS_TTL_SEC'), user: await this.toMe(user), refresh };
  }

  private async toMe(user: UserEntity): Promise<Me> {
    const shop = await this.shops.getOwnShop(user.shopId);
    return {
      id: user.id,
      email: user.email,
      displayName: user.displayName,
      roles: user.roles,
      shop: { id: shop.id, name: shop.name },
    };
  }

  private invalidCredentials(): AppError {
    return new AppError(ErrorCode.InvalidCredentials, 'The e-mail or password is not correct.');
  }
}
