import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AppConfigService } from '../config/app-config.service.js';
import { ShopsModule } from '../shops/shops.module.js';
import { UsersModule } from '../users/users.module.js';
import { MailModule } from '../mail/mail.module.js';
import { AbuseLimitsService } from './abuse-limits.service.js';
import { ClientRateLimitGuard } from './client-rate-limit.guard.js';
import { AccountLinksController } from './account-links.controller.js';
import { AccountLinksService } from './account-links.service.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { JwtAuthGuard } from './jwt-auth.guard.js';
import { JWT_AUDIENCE, JWT_ISSUER, JwtStrategy } from './jwt.strategy.js';
import { SessionCheckService } from './session-check.service.js';
import { MeController } from './me.controller.js';
import { RefreshTokenEntity } from './refresh-token.entity.js';
import { RefreshTokensService } from './refresh-tokens.service.js';
import { RolesGuard } from './roles.guard.js';
import { InvitesController } from './invites.controller.js';
import { UserTokenEntity } from './user-token.entity.js';
import { UserTokensService } from './user-tokens.service.js';

@Module({
  imports: [
    TypeOrmModule.forFeature([RefreshTokenEntity, UserTokenEntity]),
    PassportModule,
    JwtModule.registerAsync({
      inject: [AppConfigService],
      useFactory: (config: AppConfigService) => ({
        secret: config.get('JWT_SECRET'),
        signOptions: { algorithm: 'HS256', issuer: JWT_ISSUER, audience: JWT_AUDIENCE, expiresIn: config.get('JWT_ACCESS_TTL_SEC') },
      }),
    }),
    UsersModule,
    ShopsModule,
    MailModule,
  ],
  controllers: [AuthController, MeController, AccountLinksController, InvitesController],
  providers: [
    AuthService,
    RefreshTokensService,
    UserTokensService,
    AccountLinksService,
    JwtStrategy,
    SessionCheckService,
    // Order matters: abuse limits of the public routes, who is calling, then what they may do.
    AbuseLimitsService,
    { provide: APP_GUARD, useClass: ClientRateLimitGuard },
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
})
export class AuthModule {}
