import type { Family } from '@linesmith/catalog';

/** Query keys of the Reference page; the data is standards tables, so nothing invalidates them. */
export const referenceKeys = {
  all: ['reference'] as const,
  families: () => [...referenceKeys.all, 'families'] as const,
  threadTables: () => [...referenceKeys.all, 'threads'] as const,
  threadTable: (family: Family) => [...referenceKeys.threadTables(), family] as const,
  rules: () => [...referenceKeys.all, 'rules'] as const,
};
