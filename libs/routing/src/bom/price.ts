import type { SaleUnit } from '@linesmith/catalog';

const INCHES_PER_FOOT = 12;

/**
 * Price of a quantity at the catalogue price. Hose and sleeve by the inch are priced per foot;
 * counted parts per each or per pack share. Null when the sale unit does not fit the quantity.
 */
export function priceOf(priceCents: number, saleUnit: SaleUnit, quantity: number, unit: 'in' | 'each'): number | null {
  if (unit === 'in') return saleUnit.type === 'foot' ? Math.round((priceCents * quantity) / INCHES_PER_FOOT) : null;
  switch (saleUnit.type) {
    case 'each':
      return Math.round(priceCents * quantity);
    case 'pack':
      return Math.round((priceCents * quantity) / saleUnit.size);
    case 'foot':
      return null;
  }
}
