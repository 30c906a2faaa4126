/** What the fabricator has selected on the sketch. Ports are selected through their unit's id. */
export type SelectedItem =
  | { kind: 'unit'; id: string }
  | { kind: 'port'; unitId: string; id: string }
  | { kind: 'line'; id: string }
  | { kind: 'corner'; lineId: string; index: number }
  | { kind: 'zone'; id: string };

export type Selection = readonly SelectedItem[];

export const emptySelection: Selection = [];

export function sameItem(a: SelectedItem, b: SelectedItem): boolean {
  if (a.kind !== b.kind) return false;
  switch (a.kind) {
    case 'port':
      return b.kind === 'port' && a.unitId === b.unitId && a.id === b.id;
    case 'corner':
      return b.kind === 'corner' && a.lineId === b.lineId && a.index === b.index;
    default:
      return (b as { id: string }).id === a.id;
  }
}

export const isSelected = (selection: Selection, item: SelectedItem): boolean => selection.some((s) => sameItem(s, item));

/** Ids of the selected whole elements, by kind (ports and corners are parts of other elements). */
export function selectedIds(selection: Selection) {
  const units = new Set<string>();
  const lines = new Set<string>();
  const zones = new Set<string>();
  for (const item of selection) {
    if (item.kind === 'unit') units.add(item.id);
    else if (item.kind === 'line') lines.add(item.id);
    else if (item.kind === 'zone') zones.add(item.id);
  }
  return { units, lines, zones };
}
