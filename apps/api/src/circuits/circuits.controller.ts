import { Body, Controller, Delete, Get, Headers, HttpCode, Param, Patch, Post, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { CircuitEvaluation } from '@linesmith/routing';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { NotFoundError } from '../common/errors/app-error.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import { CircuitCheckService } from './circuit-check.service.js';
import { CircuitDraftsService } from './circuit-drafts.service.js';
import { CircuitRevisionsService } from './circuit-revisions.service.js';
import { CircuitsService } from './circuits.service.js';
import { CreateRevisionDto, revisionNumberSchema, UpdateCircuitDto } from './dto/circuit-input.schemas.js';
import type { CircuitDto, DraftDto, RevisionDto, RevisionSummaryDto } from './dto/circuit.dto.js';
import { draftVersionFromIfMatch } from './if-match.js';

/** A revision number in the path; anything else cannot name a revision, so it answers 404. */
function revisionNumberOf(value: string): number {
  const parsed = revisionNumberSchema.safeParse(value);
  if (!parsed.success) throw new NotFoundError('The revision');
  return parsed.data;
}

/** One circuit, its working draft, its saved versions and its check. Reads are open to the shop. */
@ApiTags('circuits')
@ApiBearerAuth()
@Controller('circuits/:id')
export class CircuitsController {
  constructor(
    private readonly circuits: CircuitsService,
    private readonly drafts: CircuitDraftsService,
    private readonly revisions: CircuitRevisionsService,
    private readonly check: CircuitCheckService,
  ) {}

  @Get()
  get(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<CircuitDto> {
    return this.circuits.get(caller.shopId, id);
  }

  @Patch()
  @Roles('fabricator', 'admin')
  update(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: UpdateCircuitDto): Promise<CircuitDto> {
    return this.circuits.update(caller.shopId, id, body);
  }

  @Delete()
  @HttpCode(204)
  @Roles('fabricator', 'admin')
  remove(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    return this.circuits.remove(caller.shopId, id);
  }

  @Get('draft')
  getDraft(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<DraftDto> {
    return this.drafts.get(caller.shopId, id);
  }

  /** Body: the circuit document. Header `If-Match: <draft version>`; a stale version answers 409 with the current draft. */
  @Put('draft')
  @Roles('fabricator', 'admin')
  saveDraft(
    @CurrentUser() caller: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Headers('if-match') ifMatch: string | undefined,
    @Body() document: unknown,
  ): Promise<{ draftVersion: number }> {
    return this.drafts.save(caller.shopId, id, draftVersionFromIfMatch(ifMatch), document);
  }

  @Get('revisions')
  listRevisions(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<RevisionSummaryDto[]> {
    return this.revisions.list(caller.shopId, id);
  }

  @Get('revisions/:number')
  getRevision(
    @CurrentUser() caller: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Param('number') number: string,
  ): Promise<RevisionDto> {
    return this.revisions.get(caller.shopId, id, revisionNumberOf(number));
  }

  /** "Save version": snapshots the current draft as the next numbered revision. */
  @Post('revisions')
  @Roles('fabricator', 'admin')
  createRevision(
    @CurrentUser() caller: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Body() body: CreateRevisionDto,
  ): Promise<RevisionDto> {
    return this.revisions.snapshot(caller.shopId, id, caller.userId, body.message);
  }

  /** The authoritative rules check of the current draft. */
  @Get('check')
  runCheck(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<CircuitEvaluation> {
    return this.check.checkDraft(caller.shopId, id);
  }
}
