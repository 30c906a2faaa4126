import type { Severity } from '@linesmith/routing';
import { z } from 'zod';

export const severitySchema = z.enum(['blocker', 'caution', 'note']) satisfies z.ZodType<Severity>;

/** One entry of `GET /api/reference/rules`: what a flag of the rules engine checks. */
export const ruleSummarySchema = z.object({
  code: z.string().min(1),
  severity: severitySchema,
  title: z.string().min(1),
  description: z.string(),
});

export type RuleSummary = z.infer<typeof ruleSummarySchema>;
