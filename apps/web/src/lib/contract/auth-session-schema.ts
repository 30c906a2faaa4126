import { z } from 'zod';
import { meSchema } from './me-schema';

/** Body of `POST /api/auth/login` and `POST /api/auth/refresh`. */
export const authSessionSchema = z.object({
  accessToken: z.string().min(1),
  expiresInSec: z.number().positive(),
  user: meSchema,
});

export type AuthSession = z.infer<typeof authSessionSchema>;
