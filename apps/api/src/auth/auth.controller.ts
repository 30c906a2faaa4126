import { Body, Controller, HttpCode, Post, Req, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { AppConfigService } from '../config/app-config.service.js';
import { AuthService, type Session } from './auth.service.js';
import { LimitPerClient } from './client-rate-limit.guard.js';
import { Public } from './decorators/public.decorator.js';
import { LoginDto, type SessionResponse } from './dto/auth.schemas.js';
import { clearRefreshCookie, readRefreshCookie, secureCookies, setRefreshCookie } from './refresh-cookie.js';

@ApiTags('auth')
@Public()
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly config: AppConfigService,
  ) {}

  @Post('login')
  @HttpCode(200)
  @LimitPerClient('login')
  async login(@Body() body: LoginDto, @Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<SessionResponse> {
    return this.respond(request, response, await this.auth.login(body.email, body.password));
  }

  @Post('refresh')
  @HttpCode(200)
  async refresh(@Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<SessionResponse> {
    return this.respond(request, response, await this.auth.refresh(readRefreshCookie(request)));
  }

  @Post('logout')
  @HttpCode(204)
  async logout(@Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<void> {
    await this.auth.logout(readRefreshCookie(request));
    clearRefreshCookie(response, secureCookies(request, this.config.get('COOKIE_SECURE')));
  }

  /** Sets the rotated cookie and answers the contract's session body (without the refresh token). */
  private respond(request: Request, response: Response, session: Session): SessionResponse {
    const { refresh, ...body } = session;
    setRefreshCookie(response, refresh.token, refresh.expiresAt, secureCookies(request, this.config.get('COOKIE_SECURE')));
    return body;
  }
}
