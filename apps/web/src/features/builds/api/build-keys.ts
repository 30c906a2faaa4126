import type { BuildListFilters } from './build-list-filters';

/** Query keys of the builds feature; mutations invalidate `lists()`. */
export const buildKeys = {
  all: ['builds'] as const,
  lists: () => [...buildKeys.all, 'list'] as const,
  list: (filters: BuildListFilters) => [...buildKeys.lists(), filters] as const,
  details: () => [...buildKeys.all, 'detail'] as const,
  detail: (id: string) => [...buildKeys.details(), id] as const,
  uploads: (buildId: string) => [...buildKeys.detail(buildId), 'uploads'] as const,
};
