import { Injectable } from '@nestjs/common';
import { createSecretKey } from 'node:crypto';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { AppConfigService } from '../config/app-config.service.js';
import type { AccessTokenClaims, AuthUser } from './auth-user.js';

export const JWT_ISSUER = 'linesmith';

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(config: AppConfigService) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // A key object made once: given the bare string, jsonwebtoken first tries (and fails) to read
      // it as a public key on every request, a thrown exception per verification. passport-jwt hands
      // the value to jsonwebtoken unchanged, which accepts a KeyObject; only its typings are narrower.
      secretOrKey: createSecretKey(Buffer.from(config.get('JWT_SECRET'), 'utf8')) as unknown as Buffer,
      issuer: JWT_ISSUER,
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  validate(claims: AccessTokenClaims): AuthUser {
    return { userId: claims.sub, shopId: claims.shopId, roles: claims.roles };
  }
}
