import { Body, Controller, Get, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { PutShopRulesDto, type ShopRulesDto } from './dto/shop-rules.dto.js';
import { ShopRulesService } from './shop-rules.service.js';

@ApiTags('shop-rules')
@ApiBearerAuth()
@Controller('shop-rules')
export class ShopRulesController {
  constructor(private readonly shopRules: ShopRulesService) {}

  @Get()
  get(@CurrentUser() caller: AuthUser): Promise<ShopRulesDto> {
    return this.shopRules.get(caller.shopId);
  }

  @Roles('admin')
  @Put()
  put(@CurrentUser() caller: AuthUser, @Body() body: PutShopRulesDto): Promise<ShopRulesDto> {
    return this.shopRules.put(caller.shopId, caller.userId, body);
  }
}
