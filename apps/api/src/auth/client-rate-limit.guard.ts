import { Injectable, SetMetadata, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import type { Request } from 'express';
import { AbuseLimitsService } from './abuse-limits.service.js';

const CLIENT_LIMIT_KEY = 'linesmith:client-limit';

/** Counts each call of the route against the caller's address (LOGIN_RATE_LIMIT per minute, shared by all API processes). */
export const LimitPerClient = (action: string) => SetMetadata(CLIENT_LIMIT_KEY, action);

/** Global: enforces `@LimitPerClient(...)` where declared. */
@Injectable()
export class ClientRateLimitGuard implements CanActivate {
  constructor(
    private readonly reflector: Reflector,
    private readonly limits: AbuseLimitsService,
  ) {}

  async canActivate(context: ExecutionContext): Promise<boolean> {
    const action = this.reflector.get<string | undefined>(CLIENT_LIMIT_KEY, context.getHandler());
    if (!action) return true;
    const request = context.switchToHttp().getRequest<Request>();
    await this.limits.consumeClient(action, request.ip ?? request.socket.remoteAddress ?? 'unknown');
    return true;
  }
}
