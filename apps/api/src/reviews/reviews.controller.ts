import { Controller, Get, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { AuthUser } from '../auth/auth-user.js';
import { CurrentUser } from '../auth/decorators/current-user.decorator.js';
import { Roles } from '../auth/decorators/roles.decorator.js';
import { ListReviewsQueryDto } from './dto/review-input.schemas.js';
import type { ReviewQueueRowDto } from './dto/review.dto.js';
import { ReviewsService } from './reviews.service.js';

/** The shop lead's queue of submissions. */
@ApiTags('reviews')
@ApiBearerAuth()
@Controller('reviews')
export class ReviewsController {
  constructor(private readonly reviews: ReviewsService) {}

  @Get()
  @Roles('reviewer', 'admin')
  queue(@CurrentUser() caller: AuthUser, @Query() query: ListReviewsQueryDto): Promise<ReviewQueueRowDto[]> {
    return this.reviews.queue(caller.shopId, query);
  }
}
