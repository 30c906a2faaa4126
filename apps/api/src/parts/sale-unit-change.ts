import type { SaleUnit } from '@linesmith/catalog';

export function sameSaleUnit(a: SaleUnit, b: SaleUnit): boolean {
  return a.type === b.type && (a.type !== 'pack' || (b.type === 'pack' && a.size === b.size));
}

/**
 * Why a part's sale unit may not change now, or undefined when it may. Stock on hand is counted in
 * sale units (feet, pieces, packs), so a new unit would silently give the same number another
 * meaning: the unit changes only while nothing is on the shelf.
 */
export function saleUnitChangeRefusal(current: SaleUnit, next: SaleUnit, stockOnHand: number): string | undefined {
  if (sameSaleUnit(current, next) || stockOnHand === 0) return undefined;
  return (
    `The sale unit cannot change while ${stockOnHand} ${unitText(current)} are on hand (stock is counted in sale units). ` +
    'Book the stock out with an adjustment first, change the unit, then book it in again in the new unit.'
  );
}

function unitText(unit: SaleUnit): string {
  if (unit.type === 'pack') return `pack(s) of ${unit.size}`;
  return unit.type === 'foot' ? 'ft' : 'piece(s)';
}
