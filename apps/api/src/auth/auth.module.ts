import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { ThrottlerModule } from '@nestjs/throttler';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AppConfigService } from '../config/app-config.service.js';
import { ShopsModule } from '../shops/shops.module.js';
import { UsersModule } from '../users/users.module.js';
import { MailModule } from '../mail/mail.module.js';
import { AccountLinksController } from './account-links.controller.js';
import { AccountLinksService } from './account-links.service.js';
import { AuthController } from './auth.controller.js';
import { AuthService } from './auth.service.js';
import { JwtAuthGuard } from './jwt-auth.guard.js';
import { JWT_ISSUER, JwtStrategy } from './jwt.strategy.js';
import { MeController } from './me.controller.js';
import { RefreshTokenEntity } from './refresh-token.entity.js';
import { RefreshTokensService } from './refresh-tokens.service.js';
import { RolesGuard } from './roles.guard.js';
import { InvitesController } from './invites.controller.js';
import { UserTokenEntity } from './user-token.entity.js';
import { UserTokensService } from './user-tokens.service.js';

const ONE_MINUTE_MS = 60_000;

@Module({
  imports: [
    TypeOrmModule.forFeature([RefreshTokenEntity, UserTokenEntity]),
    PassportModule,
    JwtModule.registerAsync({
      inject: [AppConfigService],
      useFactory: (config: AppConfigService) => ({
        secret: config.get('JWT_SECRET'),
        signOptions: { algorithm: 'HS256', issuer: JWT_ISSUER, expiresIn: config.get('JWT_ACCESS_TTL_SEC') },
      }),
    }),
    // Only the login and account-link routes use the ThrottlerGuard; the limit comes from LOGIN_RATE_LIMIT.
    ThrottlerModule.forRootAsync({
      inject: [AppConfigService],
      useFactory: (config: AppConfigService) => ({
        throttlers: [{ name: 'login', ttl: ONE_MINUTE_MS, limit: config.get('LOGIN_RATE_LIMIT') }],
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
    // Order matters: who is calling, then what they may do.
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: RolesGuard },
  ],
})
export class AuthModule {}
