import { Controller, Get, Param } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import { AuditService, type AuditEventDto } from './audit.service.js';

/** A circuit's history, readable by everyone in the shop. */
@ApiTags('audit')
@ApiBearerAuth()
@Controller('circuits/:id/audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  list(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<AuditEventDto[]> {
    return this.audit.list(caller.shopId, id);
  }
}
