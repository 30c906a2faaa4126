import { Injectable } from '@nestjs/common';
import { createSecretKey } from 'node:crypto';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { z } from 'zod';
import { AppConfigService } from '../config/app-config.service.js';

export const JWT_ISSUER = 'linesmith';
export const JWT_AUDIENCE = 'linesmith-api';

/** jsonwebtoken checks exp only when present; ours must always carry it, and a session id. */
export const verifiedClaimsSchema = z.object({
  sub: z.uuid(),
  sid: z.uuid(),
  exp: z.number().int(),
  iat: z.number().int(),
});

export type VerifiedClaims = z.output<typeof verifiedClaimsSchema>;

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
      audience: JWT_AUDIENCE,
      algorithms: ['HS256'],
      ignoreExpiration: false,
    });
  }

  /**
   * Signature, issuer, audience and expiry are checked; the claims are passed on to JwtAuthGuard,
   * which asks the database whether the session is still open. (Passport keeps strategies in one
   * process-wide registry, so a strategy must not hold one app's database connection.)
   */
  validate(payload: unknown): VerifiedClaims | null {
    const claims = verifiedClaimsSchema.safeParse(payload);
    return claims.success ? claims.data : null;
  }
}
