import { Body, Controller, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { UserDto } from '../users/dto/user.dto.js';
import { AccountLinksService } from './account-links.service.js';
import type { AuthUser } from './auth-user.js';
import { CurrentUser } from './decorators/current-user.decorator.js';
import { Roles } from './decorators/roles.decorator.js';
import { InviteUserDto } from './dto/account-link.schemas.js';

/** `POST /api/users/invite`: lives here because it needs the mail and token services of auth. */
@ApiTags('users')
@ApiBearerAuth()
@Roles('admin')
@Controller('users')
export class InvitesController {
  constructor(private readonly links: AccountLinksService) {}

  @Post('invite')
  invite(@CurrentUser() caller: AuthUser, @Body() body: InviteUserDto): Promise<UserDto> {
    return this.links.invite(caller.shopId, caller.userId, body);
  }
}
