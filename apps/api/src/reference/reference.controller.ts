import { Body, Controller, Get, HttpCode, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import {
  AdaptersBodyDto,
  MateBodyDto,
  ThreadReadingDto,
  ThreadsQueryDto,
  type AdaptersResultDto,
  type FamilyDto,
  type IdentifyResultDto,
  type MateResultDto,
  type RuleInfoDto,
  type ThreadTableDto,
} from './dto/reference.schemas.js';
import { ReferenceService } from './reference.service.js';

/** Read-only look-ups: the POST handlers compute an answer and change nothing, hence 200. */
@ApiTags('reference')
@ApiBearerAuth()
@Controller('reference')
export class ReferenceController {
  constructor(private readonly reference: ReferenceService) {}

  @Get('families')
  families(): FamilyDto[] {
    return this.reference.families();
  }

  @Get('threads')
  threads(@Query() query: ThreadsQueryDto): ThreadTableDto[] {
    return this.reference.threads(query.family);
  }

  @Post('identify')
  @HttpCode(200)
  identify(@Body() reading: ThreadReadingDto): IdentifyResultDto {
    return this.reference.identify(reading);
  }

  @Post('mate')
  @HttpCode(200)
  mate(@Body() body: MateBodyDto): MateResultDto {
    return this.reference.mate(body.a, body.b);
  }

  @Post('adapters')
  @HttpCode(200)
  adapters(@CurrentUser() caller: AuthUser, @Body() body: AdaptersBodyDto): Promise<AdaptersResultDto> {
    return this.reference.adapters(caller.shopId, body);
  }

  @Get('rules')
  rules(): RuleInfoDto[] {
    return this.reference.rules();
  }
}
