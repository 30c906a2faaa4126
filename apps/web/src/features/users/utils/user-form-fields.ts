import { z } from 'zod';
import { roleSchema } from '../../../lib/contract/role-schema';

/** Fields shared by the create and edit forms. */
export const userFormFields = {
  displayName: z.string().trim().min(1, 'Enter a display name.').max(100, 'Keep the display name under 100 characters.'),
  roles: z.array(roleSchema).min(1, 'Give the user at least one role.'),
};
