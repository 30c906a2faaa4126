import type { BillOfMaterials } from '@linesmith/routing';

/** Part id → catalogue description, from the bill of materials (which names every part the circuit uses). */
export function partNames(bom: Pick<BillOfMaterials, 'rows'>): ReadonlyMap<string, string> {
  return new Map(bom.rows.flatMap((row) => (row.partId === null ? [] : [[row.partId, row.description] as const])));
}
