import type { BuildStatus } from './build-schema';

export type BuildSortField = 'updatedAt' | 'createdAt' | 'customer';
export type SortOrder = 'asc' | 'desc';

export interface BuildListFilters {
  search: string;
  status: BuildStatus | null;
  sort: BuildSortField;
  direction: SortOrder;
  page: number;
  pageSize: number;
}

/** Most recently touched first: the build a fabricator is working on is usually at the top. */
export const defaultBuildListFilters: BuildListFilters = {
  search: '',
  status: null,
  sort: 'updatedAt',
  direction: 'desc',
  page: 1,
  pageSize: 25,
};
