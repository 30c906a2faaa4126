import type { Role } from '../../../lib/contract/role-schema';

export interface UserListFilters {
  search: string;
  role: Role | null;
  showInactive: boolean;
  page: number;
  pageSize: number;
}

export const defaultUserListFilters: UserListFilters = {
  search: '',
  role: null,
  showInactive: false,
  page: 1,
  pageSize: 50,
};
