import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import type { Page } from '../users/users.service.js';
import { CreatePartDto, ListPartsQueryDto, UpdatePartDto } from './dto/part-input.schemas.js';
import type { PartDto } from './dto/part.dto.js';
import { PartsService } from './parts.service.js';

@ApiTags('parts')
@ApiBearerAuth()
@Controller('parts')
export class PartsController {
  constructor(private readonly parts: PartsService) {}

  @Get()
  list(@CurrentUser() caller: AuthUser, @Query() query: ListPartsQueryDto): Promise<Page<PartDto>> {
    return this.parts.list(caller.shopId, query);
  }

  @Get(':id')
  get(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<PartDto> {
    return this.parts.get(caller.shopId, id);
  }

  @Roles('admin', 'parts-clerk')
  @Post()
  create(@CurrentUser() caller: AuthUser, @Body() body: CreatePartDto): Promise<PartDto> {
    return this.parts.create(caller.shopId, caller.userId, body);
  }

  @Roles('admin', 'parts-clerk')
  @Patch(':id')
  update(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: UpdatePartDto): Promise<PartDto> {
    return this.parts.update(caller.shopId, id, body);
  }

  /** Only for parts nothing uses yet; otherwise 409 and the part should be retired (PATCH retired: true). */
  @Roles('admin', 'parts-clerk')
  @Delete(':id')
  @HttpCode(204)
  remove(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    return this.parts.remove(caller.shopId, id);
  }
}
