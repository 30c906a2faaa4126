import { useQuery } from '@tanstack/react-query';
import { useApiClient } from '../../../lib/useApiClient';
import type { UserListFilters } from '../api/user-list-filters';
import { usersListQueryOptions } from '../api/users-list-query-options';

export function useUsersList(filters: UserListFilters) {
  return useQuery(usersListQueryOptions(useApiClient(), filters));
}
