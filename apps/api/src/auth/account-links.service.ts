import { Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import { ValidationError } from '../common/errors/app-error.js';
import { AppConfigService } from '../config/app-config.service.js';
import { MailService } from '../mail/mail.service.js';
import { ShopsService } from '../shops/shops.service.js';
import { hashPassword } from '../users/password.js';
import { UserEntity } from '../users/user.entity.js';
import { UsersService } from '../users/users.service.js';
import type { UserDto } from '../users/dto/user.dto.js';
import { toUserDto } from '../users/user.mapper.js';
import { AuthService, type Session } from './auth.service.js';
import type { InviteUserInput } from './dto/account-link.schemas.js';
import { endAllSessions } from './session-check.service.js';
import { UserTokensService } from './user-tokens.service.js';

const HOUR_MS = 60 * 60 * 1000;
/** Every reset request is answered after this long, so timing does not tell which addresses have accounts. */
export const RESET_ANSWER_MS = 400;

/** Invitations and password resets: one-time links sent by e-mail. */
@Injectable()
export class AccountLinksService {
  private readonly logger = new Logger('AccountLinks');

  constructor(
    private readonly users: UsersService,
    private readonly shops: ShopsService,
    private readonly tokens: UserTokensService,
    private readonly mail: MailService,
    private readonly auth: AuthService,
    private readonly config: AppConfigService,
    @InjectDataSource() private readonly dataSource: DataSource,
  ) {}

  /** Creates the user without a password and e-mails a link to choose one (valid 7 days); a failed e-mail undoes it. */
  async invite(shopId: string, inviterId: string, input: InviteUserInput): Promise<UserDto> {
    const user = await this.users.createUser(shopId, input);
    const [shop, inviter] = await Promise.all([this.shops.getOwnShop(shopId), this.users.getOwn(shopId, inviterId)]);
    const link = this.link('accept-invite', await this.tokens.issue(user.id, 'invite'));
    try {
      await this.mail.send({
        shopId,
        to: user.email,
        subject: `You are invited to ${shop.name} on Linesmith`,
        text: [
          `Hello ${user.displayName},`,
          '',
          `${inviter.displayName} invited you to join ${shop.name} on Linesmith.`,
          'Choose your password with this link (it works once, for 7 days):',
          link,
        ].join('\n'),
      });
    } catch (error) {
      // Without the e-mail nobody can use the invitation: undo it so the admin can simply retry.
      await this.dataSource.getRepository(UserEntity).delete({ id: user.id, shopId });
      throw error;
    }
    return toUserDto(user);
  }

  async acceptInvite(token: string, password: string): Promise<Session> {
    return this.auth.sessionFor(await this.setPasswordWith(token, 'invite', password));
  }

  /**
   * E-mails a reset link when an active user has this address; answers the same either way, and
   * sends at most RESET_RATE_LIMIT links per address and hour.
   */
  async requestReset(email: string): Promise<void> {
    // Answer after the same fixed time whether or not the address has an account (and however slow
    // the mail server is): the work goes on in the background if it takes longer.
    const floor = new Promise((resolve) => setTimeout(resolve, RESET_ANSWER_MS));
    const work = this.sendResetLink(email).catch((error: unknown) => this.logger.warn(`reset request failed: ${(error as Error).message}`));
    await Promise.race([work, floor]);
    await floor;
  }

  private async sendResetLink(email: string): Promise<void> {
    const user = await this.users.findForSignIn(email);
    if (!user?.active) return;
    const since = new Date(Date.now() - HOUR_MS);
    if ((await this.tokens.countIssuedSince(user.id, 'reset', since)) >= this.config.get('RESET_RATE_LIMIT')) return;
    const link = this.link('reset-password', await this.tokens.issue(user.id, 'reset'));
    try {
      await this.mail.send({
        shopId: user.shopId,
        to: user.email,
        subject: 'Reset your Linesmith password',
        text: [
          `Hello ${user.displayName},`,
          '',
          'Someone asked to reset the password of your Linesmith account. To choose a new one, open',
          'this link within an hour (it works once):',
          link,
          '',
          'If it was not you, ignore this e-mail; your password stays as it is.',
        ].join('\n'),
      });
    } catch (error) {
      // The answer must not reveal whether the address exists; the outbox records the failure.
      this.logger.warn(`reset mail not sent: ${(error as Error).message}`);
    }
  }

  async resetPassword(token: string, password: string): Promise<void> {
    await this.setPasswordWith(token, 'reset', password);
  }

  private async setPasswordWith(token: string, purpose: 'invite' | 'reset', password: string): Promise<UserEntity> {
    const passwordHash = await hashPassword(password);
    return this.dataSource.transaction(async (manager) => {
      const userId = await this.tokens.consume(manager, token, purpose);
      const repo = manager.getRepository(UserEntity);
      const user = await repo.findOneBy({ id: userId, active: true });
      if (!user) throw new ValidationError([{ path: 'token', message: 'This account is not active.' }]);
      await repo.update({ id: userId }, { passwordHash });
      // A new password ends every session opened with the old one (a reset is often a response to theft).
      await endAllSessions(manager, userId);
      return user;
    });
  }

  private link(path: string, token: string): string {
    return `${this.config.get('APP_URL').replace(/\/+$/, '')}/${path}?token=${encodeURIComponent(token)}`;
  }
}
