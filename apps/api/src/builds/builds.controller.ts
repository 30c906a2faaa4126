import { Body, Controller, Get, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import type { Page } from '../users/users.service.js';
import { BuildsService } from './builds.service.js';
import { CreateBuildDto, ListBuildsQueryDto, UpdateBuildDto } from './dto/build-input.schemas.js';
import type { BuildDto } from './dto/build.dto.js';

/** Every signed-in user of the shop reads builds; fabricators (and admins) write them. */
@ApiTags('builds')
@ApiBearerAuth()
@Controller('builds')
export class BuildsController {
  constructor(private readonly builds: BuildsService) {}

  @Get()
  list(@CurrentUser() caller: AuthUser, @Query() query: ListBuildsQueryDto): Promise<Page<BuildDto>> {
    return this.builds.list(caller.shopId, query);
  }

  @Post()
  @Roles('fabricator', 'admin')
  create(@CurrentUser() caller: AuthUser, @Body() body: CreateBuildDto): Promise<BuildDto> {
    return this.builds.create(caller.shopId, caller.userId, body);
  }

  @Get(':id')
  get(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<BuildDto> {
    return this.builds.get(caller.shopId, id);
  }

  @Patch(':id')
  @Roles('fabricator', 'admin')
  update(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: UpdateBuildDto): Promise<BuildDto> {
    return this.builds.update(caller.shopId, id, body);
  }
}
