import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { CircuitEvaluation } from '@linesmith/routing';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { CircuitDocumentDto } from './dto/evaluate.dto.js';
import { RulesService } from './rules.service.js';

@ApiTags('rules')
@ApiBearerAuth()
@Controller('rules')
export class RulesController {
  constructor(private readonly rules: RulesService) {}

  /** Computes flags and cut lengths; stores nothing, hence 200. */
  @Post('evaluate')
  @HttpCode(200)
  evaluate(@CurrentUser() caller: AuthUser, @Body() doc: CircuitDocumentDto): Promise<CircuitEvaluation> {
    return this.rules.evaluate(caller.shopId, doc);
  }
}
