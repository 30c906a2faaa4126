import { Body, Controller, Get, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import { CreateUserDto, ListUsersQueryDto, UpdateUserDto } from './dto/user-input.schemas.js';
import type { UserDto } from './dto/user.dto.js';
import { toUserDto } from './user.mapper.js';
import { UsersService, type Page } from './users.service.js';

@ApiTags('users')
@ApiBearerAuth()
@Roles('admin')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  list(@CurrentUser() caller: AuthUser, @Query() query: ListUsersQueryDto): Promise<Page<UserDto>> {
    return this.users.list(caller.shopId, query);
  }

  @Post()
  async create(@CurrentUser() caller: AuthUser, @Body() body: CreateUserDto): Promise<UserDto> {
    return toUserDto(await this.users.createUser(caller.shopId, body));
  }

  @Patch(':id')
  async update(
    @CurrentUser() caller: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Body() body: UpdateUserDto,
  ): Promise<UserDto> {
    return toUserDto(await this.users.updateUser(caller.shopId, caller.userId, id, body));
  }
}
