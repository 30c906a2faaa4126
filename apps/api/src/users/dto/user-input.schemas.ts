import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import { passwordSchema } from '../password.js';
import { roleSchema } from '../role.js';
import { versionSchema, pageSchema } from '../../common/validation/numbers.js';

const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email('Enter a valid e-mail address.').max(254));
const displayNameSchema = z.string().trim().min(1, 'Enter a name.').max(120);
const rolesSchema = z
  .array(roleSchema)
  .min(1, 'Choose at least one role.')
  .transform((roles) => [...new Set(roles)]);

export const createUserSchema = z.object({
  email: emailSchema,
  displayName: displayNameSchema,
  roles: rolesSchema,
  password: passwordSchema,
});
export class CreateUserDto extends zodDto(createUserSchema) {}

export const updateUserSchema = z.object({
  version: versionSchema,
  displayName: displayNameSchema.optional(),
  roles: rolesSchema.optional(),
  active: z.boolean().optional(),
});
export class UpdateUserDto extends zodDto(updateUserSchema) {}

const booleanQuery = z.enum(['true', 'false']).transform((value) => value === 'true');

export const listUsersQuerySchema = z.object({
  search: z.string().trim().max(200).optional(),
  role: roleSchema.optional(),
  active: booleanQuery.optional(),
  page: pageSchema,
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export class ListUsersQueryDto extends zodDto(listUsersQuerySchema) {}
export type ListUsersQuery = z.output<typeof listUsersQuerySchema>;
