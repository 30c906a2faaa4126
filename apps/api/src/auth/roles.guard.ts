import { Injectable, type CanActivate, type ExecutionContext } from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { ForbiddenError } from '../common/errors/app-error.js';
import type { Role } from '../users/role.js';
import type { AuthUser } from './auth-user.js';
import { ROLES_KEY } from './decorators/roles.decorator.js';

/** Global, after the JWT guard: enforces `@Roles(...)` where declared. */
@Injectable()
export class RolesGuard implements CanActivate {
  constructor(private readonly reflector: Reflector) {}

  canActivate(context: ExecutionContext): boolean {
    const required = this.reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, [
      context.getHandler(),
      context.getClass(),
    ]);
    if (!required?.length) return true;
    const user = context.switchToHttp().getRequest<{ user?: AuthUser }>().user;
    if (user?.roles.some((role) => required.includes(role))) return true;
    throw new ForbiddenError();
  }
}
