import { SetMetadata } from '@nestjs/common';
import type { Role } from '../../users/role.js';

export const ROLES_KEY = 'linesmith:roles';

/** Allows the handler (or controller) to callers holding at least one of these roles. */
export const Roles = (...roles: Role[]) => SetMetadata(ROLES_KEY, roles);
