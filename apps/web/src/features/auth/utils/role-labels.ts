import type { Role } from '../../../lib/contract/role-schema';

export const roleLabels: Record<Role, string> = {
  admin: 'Admin',
  fabricator: 'Fabricator',
  'parts-clerk': 'Parts clerk',
  reviewer: 'Reviewer',
};
