import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { roleSchema } from '../../users/role.js';

export const loginSchema = z.object({
  email: z.string().trim().min(1, 'Enter your e-mail address.').max(254),
  password: z.string().min(1, 'Enter your password.').max(200),
});
export class LoginDto extends zodDto(loginSchema) {}

/** Contract `Me`. */
export const meSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  displayName: z.string(),
  roles: z.array(roleSchema),
  shop: z.object({ id: z.uuid(), name: z.string() }),
});
export type Me = z.infer<typeof meSchema>;

export interface SessionResponse {
  accessToken: string;
  expiresInSec: number;
  user: Me;
}
