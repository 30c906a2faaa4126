import { Reflector } from '@nestjs/core';
import { UsersController } from '../users/users.controller.js';
import { HealthController } from '../health/health.controller.js';
import { AccountLinksController } from './account-links.controller.js';
import { AuthController } from './auth.controller.js';
import { IS_PUBLIC_KEY } from './decorators/public.decorator.js';
import { ROLES_KEY } from './decorators/roles.decorator.js';
import { LoginDto } from './dto/auth.schemas.js';
import { MeController } from './me.controller.js';

/** Wiring only: which routes are public, which are throttled, which need which role. */
describe('auth wiring of controllers', () => {
  const reflector = new Reflector();

  it('leaves sign-in, refresh, sign-out and health public, and /me signed-in only', () => {
    expect(reflector.get(IS_PUBLIC_KEY, AuthController)).toBe(true);
    expect(reflector.get(IS_PUBLIC_KEY, HealthController)).toBe(true);
    expect(reflector.get(IS_PUBLIC_KEY, MeController)).toBeUndefined();
    expect(reflector.get(IS_PUBLIC_KEY, UsersController)).toBeUndefined();
  });

  it('limits sign-in and the e-mailed-link routes per client, not refresh', () => {
    const limitOf = (handler: object) => Reflect.getMetadata('linesmith:client-limit', handler) as string | undefined;
    expect(limitOf(AuthController.prototype.login)).toBe('login');
    expect(limitOf(AuthController.prototype.refresh)).toBeUndefined();
    expect(limitOf(AccountLinksController.prototype.requestReset)).toBe('request-reset');
    expect(limitOf(AccountLinksController.prototype.resetPassword)).toBe('account-link');
    expect(limitOf(AccountLinksController.prototype.acceptInvite)).toBe('account-link');
  });

  it('keeps user administration to admins', () => {
    expect(reflector.get(ROLES_KEY, UsersController)).toEqual(['admin']);
  });

  it('validates the login body with its zod schema', () => {
    const types = Reflect.getMetadata('design:paramtypes', AuthController.prototype, 'login') as unknown[];
    expect(types[0]).toBe(LoginDto);
    expect(LoginDto.zodSchema.safeParse({ email: 'a@b.example' }).success).toBe(false);
    expect(LoginDto.zodSchema.safeParse({ email: 'a@b.example', password: 'x' }).success).toBe(true);
  });
});
