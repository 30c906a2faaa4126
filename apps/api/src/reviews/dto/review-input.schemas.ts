import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { reviewStatusSchema } from '../review-status.js';
import { revisionNumberSchema } from '../../common/validation/numbers.js';

export const submitForReviewSchema = z.object({
  message: z.string().trim().max(500, 'Use at most 500 characters.').default(''),
});
export class SubmitForReviewDto extends zodDto(submitForReviewSchema) {}

export const acknowledgeCautionSchema = z.object({
  flagKey: z.string().trim().min(1, 'Name the caution to acknowledge.').max(300),
  note: z.string().trim().min(3, 'Say in a few words why this caution is acceptable (at least 3 characters).').max(2000),
});
export class AcknowledgeCautionDto extends zodDto(acknowledgeCautionSchema) {}
export type AcknowledgeCautionInput = z.output<typeof acknowledgeCautionSchema>;

export const approveReviewSchema = z.object({
  note: z.string().trim().max(2000, 'Use at most 2000 characters.').default(''),
});
export class ApproveReviewDto extends zodDto(approveReviewSchema) {}

export const returnReviewSchema = z.object({
  comments: z.string().trim().min(3, 'Tell the fabricator what to change (at least 3 characters).').max(2000),
});
export class ReturnReviewDto extends zodDto(returnReviewSchema) {}

export const REVIEW_SORTS = ['submittedAt', 'build'] as const;

export const listReviewsQuerySchema = z.object({
  status: reviewStatusSchema.default('in-review'),
  /** `submittedAt`: oldest first (the longest waiting on top); `build`: grouped by build. */
  sort: z.enum(REVIEW_SORTS).default('submittedAt'),
  direction: z.enum(['asc', 'desc']).default('asc'),
  limit: z.coerce.number().int().min(1).max(200).default(100),
});
export class ListReviewsQueryDto extends zodDto(listReviewsQuerySchema) {}
export type ListReviewsQuery = z.output<typeof listReviewsQuerySchema>;

/** A side of a comparison: a revision number, or `draft` for the working sketch. */
export const documentRefSchema = z.union([z.literal('draft'), revisionNumberSchema]);
export type DocumentRef = z.output<typeof documentRefSchema>;

export const compareQuerySchema = z.object({ from: documentRefSchema, to: documentRefSchema });
export class CompareQueryDto extends zodDto(compareQuerySchema) {}
