import type { Part, SaleUnit } from '@linesmith/catalog';
import type { BomRow } from './bom-row.js';

const INCHES_PER_FOOT = 12;
// Quantities are sums of decimal inches; forgive float noise before rounding up to a whole unit.
const EPSILON = 1e-9;

/**
 * One part to buy. `needed`, `stockOnHand` and `quantity` are all in the part's sale unit: feet,
 * pieces or packs (stock on hand is counted the way the part is sold; 4 loose clamps from a pack
 * of 10 are 0.4 packs).
 */
export interface OrderSheetLine {
  partId: string;
  description: string;
  supplierPartNumber: string;
  saleUnit: SaleUnit;
  needed: number;
  stockOnHand: number;
  /** Whole sale units to order: feet, pieces or packs. */
  quantity: number;
  unitPriceCents: number;
  lineTotalCents: number;
}

export interface OrderSheet {
  supplierId: string | null;
  lines: OrderSheetLine[];
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
}

/** A bill-of-materials row that cannot be ordered as it stands, and why. */
export interface UnorderableRow {
  partId: string | null;
  description: string;
  reason: 'not-in-catalogue' | 'unknown-part' | 'retired' | 'unit-mismatch';
}

export interface OrderSheets {
  sheets: OrderSheet[];
  /** Parts needed but fully covered by stock on hand. */
  coveredByStock: Array<{ partId: string; needed: number; stockOnHand: number }>;
  unorderable: UnorderableRow[];
}

/** "foot", "each" or "pack of 10": how order lines and spreadsheets name a sale unit. */
export function saleUnitLabel(unit: SaleUnit): string {
  return unit.type === 'pack' ? `pack of ${unit.size}` : unit.type;
}

/** The BOM quantity in the part's sale unit (feet, pieces or packs), or null when the units do not fit. */
function neededInSaleUnits(saleUnit: SaleUnit, quantity: number, unit: BomRow['unit']): number | null {
  switch (saleUnit.type) {
    case 'foot':
      return unit === 'in' ? quantity / INCHES_PER_FOOT : null;
    case 'pack':
      return unit === 'each' ? quantity / saleUnit.size : null;
    case 'each':
      return unit === 'each' ? quantity : null;
  }
}

export function taxOf(subtotalCents: number, taxRatePercent: number): number {
  return Math.round((subtotalCents * taxRatePercent) / 100);
}

/**
 * Order sheets from the bills of materials of several circuits (DOMAIN §6): rows summed per part,
 * stock on hand taken off (never below zero), rounded up to whole sale units, priced at the
 * catalogue price per sale unit, grouped per supplier and taxed at the shop's rate per sheet.
 */
export function buildOrderSheets(
  bomRows: readonly BomRow[],
  parts: readonly Part[] | ReadonlyMap<string, Part>,
  stockByPart: ReadonlyMap<string, number>,
  taxRatePercent: number,
): OrderSheets {
  const partById = parts instanceof Map ? (parts as ReadonlyMap<string, Part>) : new Map((parts as readonly Part[]).map((p) => [p.id, p]));
  const neededByPart = new Map<string, number>();
  const unorderable: UnorderableRow[] = [];
  for (const row of bomRows) {
    if (row.partId === null) {
      unorderable.push({ partId: null, description: row.description, reason: 'not-in-catalogue' });
      continue;
    }
    const part = partById.get(row.partId);
    if (!part) {
      unorderable.push({ partId: row.partId, description: row.description, reason: 'unknown-part' });
      continue;
    }
    const needed = neededInSaleUnits(part.saleUnit, row.quantity, row.unit);
    if (needed === null) {
      unorderable.push({ partId: part.id, description: part.description, reason: 'unit-mismatch' });
      continue;
    }
    neededByPart.set(part.id, (neededByPart.get(part.id) ?? 0) + needed);
  }

  const linesBySupplier = new Map<string | null, OrderSheetLine[]>();
  const coveredByStock: OrderSheets['coveredByStock'] = [];
  for (const [partId, needed] of neededByPart) {
    const part = partById.get(partId) as Part;
    if (part.retired) {
      unorderable.push({ partId, description: part.description, reason: 'retired' });
      continue;
    }
    const stockOnHand = Math.max(0, stockByPart.get(partId) ?? 0);
    const shortfall = Math.max(0, needed - stockOnHand);
    // Whole sale units, rounded up: whole feet of hose, whole packs.
    const quantity = shortfall > EPSILON ? Math.ceil(shortfall - EPSILON) : 0;
    if (quantity === 0) {
      coveredByStock.push({ partId, needed, stockOnHand });
      continue;
    }
    const line: OrderSheetLine = {
      partId,
      description: part.description,
      supplierPartNumber: part.supplierPartNumber,
      saleUnit: part.saleUnit,
      needed,
      stockOnHand,
      quantity,
      unitPriceCents: part.priceCents,
      lineTotalCents: quantity * part.priceCents,
    };
    const lines = linesBySupplier.get(part.supplierId) ?? [];
    lines.push(line);
    linesBySupplier.set(part.supplierId, lines);
  }

  const sheets = [...linesBySupplier].map(([supplierId, lines]): OrderSheet => {
    lines.sort((a, b) => a.supplierPartNumber.localeCompare(b.supplierPartNumber) || a.description.localeCompare(b.description));
    const subtotalCents = lines.reduce((sum, line) => sum + line.lineTotalCents, 0);
    const taxCents = taxOf(subtotalCents, taxRatePercent);
    return { supplierId, lines, subtotalCents, taxCents, totalCents: subtotalCents + taxCents };
  });
  // Sheets with a supplier first, in a stable order; the sheet of parts without a supplier last.
  sheets.sort((a, b) => (a.supplierId === null ? 1 : b.supplierId === null ? -1 : a.supplierId.localeCompare(b.supplierId)));
  return { sheets, coveredByStock, unorderable };
}
