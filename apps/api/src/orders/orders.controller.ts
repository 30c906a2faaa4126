import { Body, Controller, Get, Headers, HttpCode, Param, Post, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import { sendWorkbook } from '../spreadsheets/spreadsheet.js';
import { parseWithSchema } from '../common/validation/zod-validation.pipe.js';
import { DraftOrdersDto, idempotencyKeySchema, ReceiveOrderDto, type DraftOrdersResult, type OrderDto } from './dto/order.schemas.js';
import { OrdersService } from './orders.service.js';

@ApiTags('orders')
@ApiBearerAuth()
@Roles('admin', 'parts-clerk')
@Controller('orders')
export class OrdersController {
  constructor(private readonly orders: OrdersService) {}

  @Post('draft')
  draft(@CurrentUser() caller: AuthUser, @Body() body: DraftOrdersDto): Promise<DraftOrdersResult> {
    return this.orders.draft(caller.shopId, caller.userId, body.circuitIds);
  }

  @Get()
  list(@CurrentUser() caller: AuthUser): Promise<OrderDto[]> {
    return this.orders.list(caller.shopId);
  }

  @Get(':id')
  get(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<OrderDto> {
    return this.orders.get(caller.shopId, id);
  }

  @Get(':id/export.xlsx')
  async export(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string, @Res() response: Response): Promise<void> {
    const file = await this.orders.exportSheet(caller.shopId, id);
    sendWorkbook(response, file.fileName, file.body);
  }

  @Post(':id/send')
  @HttpCode(200)
  send(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<OrderDto> {
    return this.orders.send(caller.shopId, caller.userId, id);
  }

  @Post(':id/receive')
  @HttpCode(200)
  receive(
    @CurrentUser() caller: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Body() body: ReceiveOrderDto,
    @Headers('idempotency-key') idempotencyKey: string | undefined,
  ): Promise<OrderDto> {
    const key = parseWithSchema(idempotencyKeySchema, idempotencyKey, 'Idempotency-Key');
    return this.orders.receive(caller.shopId, caller.userId, id, body, key);
  }
}
