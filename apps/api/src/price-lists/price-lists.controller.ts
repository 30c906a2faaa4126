import { Body, Controller, HttpCode, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import { ApiBearerAuth, ApiConsumes, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import type { ImportCounts } from './check-price-list.js';
import { PriceListFormDto } from './dto/price-list.schemas.js';
import { PriceListFileInterceptor } from './price-list-file.interceptor.js';
import { PriceListsService, type PriceListPreview } from './price-lists.service.js';
import type { UploadedFile as PriceListFile } from './read-price-list.js';

/** Multipart: `file` (.xlsx or .csv, ≤ 5 MB), `supplierId`, and `mapping` (JSON) once the columns are chosen. */
@ApiTags('price-lists')
@ApiBearerAuth()
@ApiConsumes('multipart/form-data')
@Roles('admin', 'parts-clerk')
@Controller('price-lists')
export class PriceListsController {
  constructor(private readonly priceLists: PriceListsService) {}

  @Post('preview')
  @HttpCode(200)
  @UseInterceptors(PriceListFileInterceptor)
  preview(@CurrentUser() caller: AuthUser, @UploadedFile() file: PriceListFile | undefined, @Body() body: PriceListFormDto): Promise<PriceListPreview> {
    return this.priceLists.preview(caller.shopId, file, body);
  }

  @Post('commit')
  @HttpCode(200)
  @UseInterceptors(PriceListFileInterceptor)
  commit(@CurrentUser() caller: AuthUser, @UploadedFile() file: PriceListFile | undefined, @Body() body: PriceListFormDto): Promise<{ counts: ImportCounts }> {
    return this.priceLists.commit(caller.shopId, file, body);
  }
}
