import { Body, Controller, Get, HttpCode, Param, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import type { CircuitDto } from '../circuits/dto/circuit.dto.js';
import { ParseIdPipe } from '../common/validation/parse-id.pipe.js';
import { CircuitCompareService } from './circuit-compare.service.js';
import {
  AcknowledgeCautionDto,
  ApproveReviewDto,
  CompareQueryDto,
  ReturnReviewDto,
  SubmitForReviewDto,
} from './dto/review-input.schemas.js';
import type { AcknowledgementDto, CircuitComparisonDto, ReviewDto } from './dto/review.dto.js';
import { ReviewsService } from './reviews.service.js';

/** Submitting a circuit, its review and sign-off, and comparing its versions. Reads are open to the shop. */
@ApiTags('reviews')
@ApiBearerAuth()
@Controller('circuits/:id')
export class CircuitReviewController {
  constructor(
    private readonly reviews: ReviewsService,
    private readonly compareService: CircuitCompareService,
  ) {}

  @Post('submit')
  @HttpCode(200)
  @Roles('fabricator', 'admin')
  submit(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: SubmitForReviewDto): Promise<CircuitDto> {
    return this.reviews.submit(caller, id, body.message);
  }

  @Get('review')
  get(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<ReviewDto> {
    return this.reviews.get(caller.shopId, id);
  }

  @Post('review/acknowledgements')
  @Roles('reviewer', 'admin')
  acknowledge(
    @CurrentUser() caller: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Body() body: AcknowledgeCautionDto,
  ): Promise<AcknowledgementDto> {
    return this.reviews.acknowledge(caller, id, body);
  }

  @Post('review/approve')
  @HttpCode(200)
  @Roles('reviewer', 'admin')
  approve(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: ApproveReviewDto): Promise<ReviewDto> {
    return this.reviews.approve(caller, id, body.note);
  }

  @Post('review/return')
  @HttpCode(200)
  @Roles('reviewer', 'admin')
  returnToFabricator(
    @CurrentUser() caller: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Body() body: ReturnReviewDto,
  ): Promise<ReviewDto> {
    return this.reviews.returnToFabricator(caller, id, body.comments);
  }

  /** `?from=<revision number|draft>&to=<revision number|draft>`. */
  @Get('compare')
  compare(@CurrentUser() caller: AuthUser, @Param('id', ParseIdPipe) id: string, @Query() query: CompareQueryDto): Promise<CircuitComparisonDto> {
    return this.compareService.compare(caller.shopId, id, query.from, query.to);
  }
}
