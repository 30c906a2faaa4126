import type { CircuitCheck } from '../api/check-schema';

/** Part id → catalogue description, from the bill of materials (which names every part the circuit uses). */
export function partDescriptions(bom: CircuitCheck['bom']): ReadonlyMap<string, string> {
  const map = new Map<string, string>();
  for (const row of bom.rows) if (row.partId !== null) map.set(row.partId, row.description);
  return map;
}
