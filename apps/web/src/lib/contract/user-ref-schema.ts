import { z } from 'zod';

/** A user as the API names them on other records (who created or wrote something). */
export const userRefSchema = z.object({ id: z.string().min(1), displayName: z.string() });
export type UserRef = z.infer<typeof userRefSchema>;
