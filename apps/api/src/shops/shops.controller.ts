import { Body, Controller, Get, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { UpdateShopProfileDto, type ShopProfileDto } from './dto/shop-profile.schemas.js';
import { toShopProfileDto } from './shop-profile.mapper.js';
import { ShopsService } from './shops.service.js';

/** The caller's own shop profile: every user reads it, the admin edits it. */
@ApiTags('shop')
@ApiBearerAuth()
@Controller('shop')
export class ShopsController {
  constructor(private readonly shops: ShopsService) {}

  @Get()
  async get(@CurrentUser() caller: AuthUser): Promise<ShopProfileDto> {
    return toShopProfileDto(await this.shops.getOwnShop(caller.shopId));
  }

  @Roles('admin')
  @Patch()
  async update(@CurrentUser() caller: AuthUser, @Body() body: UpdateShopProfileDto): Promise<ShopProfileDto> {
    return toShopProfileDto(await this.shops.updateProfile(caller.shopId, body));
  }
}
