import { Body, Controller, Get, Param, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import { CircuitsService } from './circuits.service.js';
import { CreateCircuitDto } from './dto/circuit-input.schemas.js';
import type { CircuitDto } from './dto/circuit.dto.js';

@ApiTags('circuits')
@ApiBearerAuth()
@Controller('builds/:buildId/circuits')
export class BuildCircuitsController {
  constructor(private readonly circuits: CircuitsService) {}

  @Get()
  list(@CurrentUser() caller: AuthUser, @Param('buildId', ParseIdPipe) buildId: string): Promise<CircuitDto[]> {
    return this.circuits.listForBuild(caller.shopId, buildId);
  }

  @Post()
  @Roles('fabricator', 'admin')
  create(
    @CurrentUser() caller: AuthUser,
    @Param('buildId', ParseIdPipe) buildId: string,
    @Body() body: CreateCircuitDto,
  ): Promise<CircuitDto> {
    return this.circuits.create(caller.shopId, buildId, body);
  }
}
