import { z } from 'zod';
import { buildSchema } from './build-schema';

export const buildPageSchema = z.object({
  items: z.array(buildSchema),
  total: z.number().int().nonnegative(),
  page: z.number().int().positive(),
  pageSize: z.number().int().positive(),
});

export type BuildPage = z.infer<typeof buildPageSchema>;
