import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import { CreateStockAdjustmentDto, type StockAdjustmentDto, type StockAdjustmentResult } from './dto/stock-adjustment.schemas.js';
import { StockService } from './stock.service.js';

@ApiTags('stock')
@ApiBearerAuth()
@Controller('parts/:id/stock-adjustments')
export class StockController {
  constructor(private readonly stock: StockService) {}

  @Get()
  history(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) partId: string): Promise<StockAdjustmentDto[]> {
    return this.stock.history(caller.shopId, partId);
  }

  @Roles('admin', 'parts-clerk')
  @Post()
  adjust(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) partId: string, @Body() body: CreateStockAdjustmentDto): Promise<StockAdjustmentResult> {
    return this.stock.adjust(caller.shopId, caller.userId, partId, body);
  }
}
