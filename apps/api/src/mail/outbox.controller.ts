import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { MailService, type OutboxDto } from './mail.service.js';

@ApiTags('outbox')
@ApiBearerAuth()
@Roles('admin')
@Controller('outbox')
export class OutboxController {
  constructor(private readonly mail: MailService) {}

  @Get()
  list(@CurrentUser() caller: AuthUser): Promise<OutboxDto[]> {
    return this.mail.listOutbox(caller.shopId);
  }
}
