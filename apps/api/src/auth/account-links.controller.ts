import { Body, Controller, HttpCode, Post, Req, Res } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { AppConfigService } from '../config/app-config.service.js';
import { AccountLinksService } from './account-links.service.js';
import { LimitPerClient } from './client-rate-limit.guard.js';
import { Public } from './decorators/public.decorator.js';
import { RequestResetDto, TokenPasswordDto } from './dto/account-link.schemas.js';
import type { SessionResponse } from './dto/auth.schemas.js';
import { secureCookies, setRefreshCookie } from './refresh-cookie.js';

/** The public ends of the e-mailed links: accept an invitation, reset a password. */
@ApiTags('auth')
@Public()
@Controller('auth')
export class AccountLinksController {
  constructor(
    private readonly links: AccountLinksService,
    private readonly config: AppConfigService,
  ) {}

  /** Sets the password and signs in: the same answer as login. */
  @Post('accept-invite')
  @HttpCode(200)
  @LimitPerClient('account-link')
  async acceptInvite(@Body() body: TokenPasswordDto, @Req() request: Request, @Res({ passthrough: true }) response: Response): Promise<SessionResponse> {
    const { refresh, ...session } = await this.links.acceptInvite(body.token, body.password);
    setRefreshCookie(response, refresh.token, refresh.expiresAt, secureCookies(request, this.config.get('COOKIE_SECURE')));
    return session;
  }

  @Post('request-reset')
  @HttpCode(202)
  @LimitPerClient('request-reset')
  async requestReset(@Body() body: RequestResetDto): Promise<void> {
    await this.links.requestReset(body.email);
  }

  @Post('reset-password')
  @HttpCode(204)
  @LimitPerClient('account-link')
  async resetPassword(@Body() body: TokenPasswordDto): Promise<void> {
    await this.links.resetPassword(body.token, body.password);
  }
}
