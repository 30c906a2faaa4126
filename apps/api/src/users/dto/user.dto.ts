import { z } from 'zod';
import { roleSchema } from '../role.js';

/** The API shape of a user (contract `User`); never exposes the password hash. */
export const userSchema = z.object({
  id: z.uuid(),
  email: z.email(),
  displayName: z.string(),
  roles: z.array(roleSchema),
  active: z.boolean(),
  version: z.number().int(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type UserDto = z.infer<typeof userSchema>;
