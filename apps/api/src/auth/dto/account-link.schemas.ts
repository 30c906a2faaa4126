import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { passwordSchema } from '../../users/password.js';
import { roleSchema } from '../../users/role.js';

const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email('Enter a valid e-mail address.').max(254));
const tokenSchema = z.string().trim().min(20, 'This link is not complete.').max(200);

export const inviteUserSchema = z.object({
  email: emailSchema,
  displayName: z.string().trim().min(1, 'Enter a name.').max(120),
  roles: z
    .array(roleSchema)
    .min(1, 'Choose at least one role.')
    .transform((roles) => [...new Set(roles)]),
});
export class InviteUserDto extends zodDto(inviteUserSchema) {}
export type InviteUserInput = z.output<typeof inviteUserSchema>;

export const tokenPasswordSchema = z.object({ token: tokenSchema, password: passwordSchema });
export class TokenPasswordDto extends zodDto(tokenPasswordSchema) {}

export const requestResetSchema = z.object({ email: z.string().trim().min(1, 'Enter your e-mail address.').max(254) });
export class RequestResetDto extends zodDto(requestResetSchema) {}
