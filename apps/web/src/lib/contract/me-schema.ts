import { z } from 'zod';
import { roleSchema } from './role-schema';

/** `GET /api/me`, also embedded in the sign-in and refresh responses. */
export const meSchema = z.object({
  id: z.string().min(1),
  email: z.string().min(1),
  displayName: z.string(),
  roles: z.array(roleSchema),
  shop: z.object({ id: z.string().min(1), name: z.string() }),
});

export type Me = z.infer<typeof meSchema>;
