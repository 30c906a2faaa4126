import { Controller, Get, Param, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { z } from 'zod';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import { zodDto } from '../common/validation/zod-dto.js';
import { CutListService } from './cut-list.service.js';
import { sendWorkbook } from './spreadsheet.js';
import { revisionNumberSchema } from '../common/validation/numbers.js';

export const cutListQuerySchema = z.object({
  revision: revisionNumberSchema.optional(),
  draft: z
    .enum(['1', '0', 'true', 'false'])
    .transform((value) => value === '1' || value === 'true')
    .default(false),
});
export class CutListQueryDto extends zodDto(cutListQuerySchema) {}

@ApiTags('circuits')
@ApiBearerAuth()
@Controller('circuits/:id')
export class CutListController {
  constructor(private readonly cutLists: CutListService) {}

  @Get('cut-list.xlsx')
  async cutList(
    @CurrentUser() caller: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Query() query: CutListQueryDto,
    @Res() response: Response,
  ): Promise<void> {
    const file = await this.cutLists.export(caller.shopId, id, query);
    sendWorkbook(response, file.fileName, file.body);
  }
}
