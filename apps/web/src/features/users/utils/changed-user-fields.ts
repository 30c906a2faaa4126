import type { UpdateUserInput } from '../api/update-user-input';
import type { User } from '../api/user-schema';
import type { EditUserFormValues } from './edit-user-form-schema';

/**
 * Only the fields the admin actually changed, so a retry after a conflict does not overwrite
 * what someone else changed in the other fields meanwhile.
 */
export function changedUserFields(original: User, edited: EditUserFormValues): Omit<UpdateUserInput, 'version'> {
  const changes: Omit<UpdateUserInput, 'version'> = {};
  if (edited.displayName !== original.displayName) changes.displayName = edited.displayName;
  const sameRoles =
    edited.roles.length === original.roles.length && edited.roles.every((role) => original.roles.includes(role));
  if (!sameRoles) changes.roles = edited.roles;
  return changes;
}
