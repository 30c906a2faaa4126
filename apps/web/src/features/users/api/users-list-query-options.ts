import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { ApiClient } from '../../../lib/api-client';
import { userKeys } from './user-keys';
import type { UserListFilters } from './user-list-filters';
import { userPageSchema } from './user-page-schema';

export function usersListQueryOptions(client: ApiClient, filters: UserListFilters) {
  const params = new URLSearchParams({ page: String(filters.page), pageSize: String(filters.pageSize) });
  if (filters.search.trim()) params.set('search', filters.search.trim());
  if (filters.role) params.set('role', filters.role);
  // Inactive users are hidden unless asked for; leaving `active` out lists everyone.
  if (!filters.showInactive) params.set('active', 'true');
  return queryOptions({
    queryKey: userKeys.list(filters),
    queryFn: ({ signal }) => client.request(`/api/users?${params.toString()}`, { schema: userPageSchema, signal }),
    placeholderData: keepPreviousData,
  });
}
