import type { Family, PartKind } from '@linesmith/catalog';

export interface PartListFilters {
  kind: PartKind | null;
  family: Family | null;
  /** Dash size as typed ("-6" or "6"); empty for any. */
  dash: string;
  supplierId: string | null;
  search: string;
  includeRetired: boolean;
  page: number;
  pageSize: number;
}

export const defaultPartListFilters: PartListFilters = {
  kind: null,
  family: null,
  dash: '',
  supplierId: null,
  search: '',
  includeRetired: false,
  page: 1,
  pageSize: 50,
};
