import type { ReferenceRow } from '@linesmith/catalog';

export interface SourceGroup {
  source: string;
  sizes: string[];
}

/** The sources of a table's rows with the sizes each covers, in row order. */
export function groupRowSources(rows: readonly Pick<ReferenceRow, 'size' | 'source'>[]): SourceGroup[] {
  const groups = new Map<string, string[]>();
  for (const row of rows) {
    const sizes = groups.get(row.source) ?? [];
    sizes.push(row.size);
    groups.set(row.source, sizes);
  }
  return [...groups].map(([source, sizes]) => ({ source, sizes }));
}
