import type { Role } from '../../../lib/contract/role-schema';

/** Body of `PATCH /api/users/:id`; `version` is the row version the change was made against. */
export interface UpdateUserInput {
  version: number;
  displayName?: string;
  roles?: Role[];
  active?: boolean;
}
