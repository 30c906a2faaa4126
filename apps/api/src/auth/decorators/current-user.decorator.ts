import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import { UnauthorizedError } from '../../common/errors/app-error.js';
import type { AuthUser } from '../auth-user.js';

/** The signed-in caller `{ userId, shopId, roles }`, set by the JWT guard. */
export const CurrentUser = createParamDecorator((_data: unknown, context: ExecutionContext): AuthUser => {
  const user = context.switchToHttp().getRequest<{ user?: AuthUser }>().user;
  if (!user) throw new UnauthorizedError();
  return user;
});
