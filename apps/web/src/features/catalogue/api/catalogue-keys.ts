import type { PartListFilters } from './part-list-filters';

/** Query keys of the catalogue; part writes invalidate `parts()`, supplier writes `suppliers()`. */
export const catalogueKeys = {
  all: ['catalogue'] as const,
  parts: () => [...catalogueKeys.all, 'parts'] as const,
  partList: (filters: PartListFilters) => [...catalogueKeys.parts(), 'list', filters] as const,
  stockHistory: (partId: string) => [...catalogueKeys.parts(), 'stock', partId] as const,
  suppliers: () => [...catalogueKeys.all, 'suppliers'] as const,
  supplierList: (includeInactive: boolean) => [...catalogueKeys.suppliers(), { includeInactive }] as const,
};
