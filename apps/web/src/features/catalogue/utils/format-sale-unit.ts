import type { SaleUnit } from '@linesmith/catalog';

export function formatSaleUnit(unit: SaleUnit): string {
  if (unit.type === 'pack') return `pack of ${unit.size}`;
  return unit.type === 'foot' ? 'foot' : 'each';
}
