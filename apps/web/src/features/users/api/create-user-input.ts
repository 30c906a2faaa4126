import type { Role } from '../../../lib/contract/role-schema';

/** Body of `POST /api/users`. */
export interface CreateUserInput {
  email: string;
  displayName: string;
  roles: Role[];
  password: string;
}
