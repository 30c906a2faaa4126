import { Body, Controller, Get, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import { CreateSupplierDto, ListSuppliersQueryDto, UpdateSupplierDto } from './dto/supplier-input.schemas.js';
import type { SupplierDto } from './dto/supplier.dto.js';
import { toSupplierDto } from './supplier.mapper.js';
import { SuppliersService } from './suppliers.service.js';

@ApiTags('suppliers')
@ApiBearerAuth()
@Controller('suppliers')
export class SuppliersController {
  constructor(private readonly suppliers: SuppliersService) {}

  @Get()
  list(@CurrentUser() caller: AuthUser, @Query() query: ListSuppliersQueryDto): Promise<SupplierDto[]> {
    return this.suppliers.list(caller.shopId, query);
  }

  @Roles('admin', 'parts-clerk')
  @Post()
  async create(@CurrentUser() caller: AuthUser, @Body() body: CreateSupplierDto): Promise<SupplierDto> {
    return toSupplierDto(await this.suppliers.create(caller.shopId, body));
  }

  @Roles('admin', 'parts-clerk')
  @Patch(':id')
  async update(
    @CurrentUser() caller: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Body() body: UpdateSupplierDto,
  ): Promise<SupplierDto> {
    return toSupplierDto(await this.suppliers.update(caller.shopId, id, body));
  }
}
