import { Body, Controller, HttpCode, Post, Res, UseGuards } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { Response } from 'express';
import { AppConfigService } from '../config/app-config.service.js';
import { AccountLinksService } from './account-links.service.js';
import { Public } from './decorators/public.decorator.js';
import { RequestResetDto, TokenPasswordDto } from './dto/account-link.schemas.js';
import type { SessionResponse } from './dto/auth.schemas.js';
import { setRefreshCookie } from './refresh-cookie.js';

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
  @UseGuards(ThrottlerGuard)
  async acceptInvite(@Body() body: TokenPasswordDto, @Res({ passthrough: true }) response: Response): Promise<SessionResponse> {
    const { refresh, ...session } = await this.links.acceptInvite(body.token, body.password);
    setRefreshCookie(response, refresh.token, refresh.expiresAt, this.config.get('COOKIE_SECURE'));
    return session;
  }

  @Post('request-reset')
  @HttpCode(202)
  @UseGuards(ThrottlerGuard)
  async requestReset(@Body() body: RequestResetDto): Promise<void> {
    await this.links.requestReset(body.email);
  }

  @Post('reset-password')
  @HttpCode(204)
  @UseGuards(ThrottlerGuard)
  async resetPassword(@Body() body: TokenPasswordDto): Promise<void> {
    await this.links.resetPassword(body.token, body.password);
  }
}
