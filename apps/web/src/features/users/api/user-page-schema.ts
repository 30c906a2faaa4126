import { z } from 'zod';
import { userSchema } from './user-schema';

export const userPageSchema = z.object({
  items: z.array(userSchema),
  total: z.number().int().nonnegative(),
  page: z.number().int().positive(),
  pageSize: z.number().int().positive(),
});

export type UserPage = z.infer<typeof userPageSchema>;
