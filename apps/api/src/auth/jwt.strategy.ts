import { Injectable } from '@nestjs/common';
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
      secretOrKey: config.get('JWT_SECRET'),
      issuer: JWT_ISSUER,
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  validate(claims: AccessTokenClaims): AuthUser {
    return { userId: claims.sub, shopId: claims.shopId, roles: claims.roles };
  }
}
