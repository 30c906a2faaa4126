import { Injectable, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { UnauthorizedError } from '../common/errors/app-error.js';
import type { AuthUser } from './auth-user.js';
import { IS_PUBLIC_KEY } from './decorators/public.decorator.js';
import type { VerifiedClaims } from './jwt.strategy.js';
import { SessionCheckService } from './session-check.service.js';

/**
 * Global: every route needs a valid access token of an open session unless marked `@Public()`.
 * Passport verifies the token; then the caller's shop and roles are read from the database, so a
 * signed-out, deactivated or re-roled user is refused on the very next request.
 */
@Injectable()
export class JwtAuthGuard extends AuthGuard('jwt') {
  constructor(
    private readonly reflector: Reflector,
    private readonly sessions: SessionCheckService,
  ) {
    super();
  }

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const isPublic = this.reflector.getAllAndOverride<boolean>(IS_PUBLIC_KEY, [context.getHandler(), context.getClass()]);
    if (isPublic) return true;
    await super.canActivate(context);
    const request = context.switchToHttp().getRequest<{ user?: VerifiedClaims | AuthUser }>();
    const claims = request.user as VerifiedClaims;
    const caller = await this.sessions.caller(claims.sub, claims.sid);
    if (!caller) throw new UnauthorizedError('Your session has ended. Please sign in.');
    request.user = caller;
    return true;
  }

  override handleRequest<TUser>(error: unknown, user: TUser | false): TUser {
    if (error || !user) throw new UnauthorizedError('Please sign in.');
    return user;
  }
}
