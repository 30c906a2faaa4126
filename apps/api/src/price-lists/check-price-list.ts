import type { Part, SaleUnit } from '@linesmith/catalog';
import { saleUnitChangeRefusal, sameSaleUnit } from '../parts/sale-unit-change.js';
import type { MappingField } from './dto/price-list.schemas.js';
import type { ImportIssue } from './price-list-errors.js';
import type { CellValue, PriceListSheet } from './read-price-list.js';

export interface PriceChange {
  row: number;
  partId: string;
  partVersion: number;
  supplierPartNumber: string;
  priceCents: number;
  description: string;
  saleUnit: SaleUnit;
  status: 'updated' | 'unchanged';
}

export interface ImportCounts {
  /** Always 0: new parts need attributes and are created in the catalogue editor. */
  new: number;
  updated: number;
  unchanged: number;
  errors: number;
}

export interface PriceListCheck {
  changes: PriceChange[];
  report: ImportIssue[];
  counts: ImportCounts;
}

type ExistingPart = Part & { version: number };

const MAX_PRICE_CENTS = 100_000_000; // $1,000,000.00: far above any line part, far below the column's limit.

/**
 * "12.5", "$1,234.50", 12.5 → cents; so are the decimal-comma forms of lists from other locales,
 * "12,50" and "1.234,50" (a comma followed by one or two digits cannot be a thousands separator).
 * Undefined when it is not a plain non-negative amount with at most 2 decimals.
 */
export function parsePriceCents(value: CellValue): number | undefined {
  if (typeof value === 'number') {
    if (!Number.isFinite(value) || value < 0) return undefined;
    const cents = Math.round(value * 100);
    return Math.abs(cents - value * 100) < 1e-6 ? cents : undefined;
  }
  if (typeof value !== 'string') return undefined;
  const amount = value.replace(/^\$\s*/, '');
  const decimalComma = /^\d{1,3}(\.\d{3})*,\d{1,2}$|^\d+,\d{1,2}$/.test(amount);
  const text = decimalComma ? amount.replace(/\./g, '').replace(',', '.') : amount.replace(/,(?=\d{3}(\D|$))/g, '');
  if (!/^\d+(\.\d{1,2})?$/.test(text)) return undefined;
  return Math.round(Number(text) * 100);
}

/** "each"/"ea", "foot"/"ft", "pack"/"pk" (with a pack size) or "pack of 10". */
export function parseSaleUnit(unit: CellValue, packSize: CellValue): SaleUnit | string {
  const text = unit === null ? '' : String(unit).trim().toLowerCase();
  const packOf = /^(?:pack|pk|box|bag)\s*(?:of)?\s*(\d+)$/.exec(text);
  if (/^(each|ea|pc|pcs|piece)$/.test(text)) return { type: 'each' };
  if (/^(foot|feet|ft)$/.test(text)) return { type: 'foot' };
  const sizeText = packOf?.[1] ?? (packSize === null ? '' : String(packSize).trim());
  if (packOf || /^(pack|pk|box|bag)$/.test(text)) {
    const size = Number(sizeText);
    return Number.isInteger(size) && size > 0 ? { type: 'pack', size } : 'Give the pack size as a whole number of pieces.';
  }
  return 'Use each, foot or pack (with a pack size).';
}

/**
 * Checks every row against the supplier's catalogue parts (matched by supplier part number,
 * ignoring case): prices, sale units and descriptions; duplicates within the file and unknown
 * part numbers are errors. Writes nothing.
 */
export function checkPriceList(
  sheet: Pick<PriceListSheet, 'rows'>,
  columns: Partial<Record<MappingField, number>>,
  headers: readonly string[],
  supplierParts: readonly ExistingPart[],
): PriceListCheck {
  const byNumber = new Map(supplierParts.map((part) => [part.supplierPartNumber.trim().toUpperCase(), part]));
  const firstRowOf = new Map<string, number>();
  const report: ImportIssue[] = [];
  const changes: PriceChange[] = [];
  const headerOf = (field: MappingField) => (columns[field] === undefined ? '' : headers[columns[field] as number]);
  const cellOf = (cells: CellValue[], field: MappingField): CellValue => (columns[field] === undefined ? null : (cells[columns[field] as number] ?? null));

  for (const { row, cells } of sheet.rows) {
    const issue = (field: MappingField, message: string) => report.push({ row, column: headerOf(field), message });
    const before = report.length;
    const numberCell = cellOf(cells, 'partNumber');
    const partNumber = numberCell === null ? '' : String(numberCell).trim();
    const key = partNumber.toUpperCase();
    let part: ExistingPart | undefined;
    if (!partNumber) issue('partNumber', 'The part number is missing.');
    else if (firstRowOf.has(key)) issue('partNumber', `Part number ${partNumber} appears again (first on row ${firstRowOf.get(key)}).`);
    else {
      firstRowOf.set(key, row);
      part = byNumber.get(key);
      if (!part) issue('partNumber', `Unknown part number ${partNumber} for this supplier. Add new parts in the catalogue editor first.`);
    }
    const priceCents = parsePriceCents(cellOf(cells, 'price'));
    if (priceCents === undefined) issue('price', 'The price must be an amount such as 12.50 (no negative numbers, at most 2 decimals).');
    else if (priceCents > MAX_PRICE_CENTS) issue('price', 'The price is above $1,000,000.00; check the column.');
    let saleUnit: SaleUnit | undefined = part?.saleUnit;
    if (columns.saleUnit !== undefined) {
      const parsed = parseSaleUnit(cellOf(cells, 'saleUnit'), cellOf(cells, 'packSize'));
      if (typeof parsed === 'string') issue('saleUnit', parsed);
      else saleUnit = parsed;
    }
    const refusal = part && saleUnit ? saleUnitChangeRefusal(part.saleUnit, saleUnit, part.stockOnHand) : undefined;
    if (refusal) issue('saleUnit', refusal);
    let description = part?.description ?? '';
    if (columns.description !== undefined) {
      const text = cellOf(cells, 'description');
      const trimmed = text === null ? '' : String(text).trim();
      if (trimmed.length > 200) issue('description', 'The description is longer than 200 characters.');
      else if (trimmed) description = trimmed;
    }
    if (report.length > before || !part || priceCents === undefined || !saleUnit) continue;
    const unchanged = part.priceCents === priceCents && part.description === description && sameSaleUnit(part.saleUnit, saleUnit);
    changes.push({
      row,
      partId: part.id,
      partVersion: part.version,
      supplierPartNumber: part.supplierPartNumber,
      priceCents,
      description,
      saleUnit,
      status: unchanged ? 'unchanged' : 'updated',
    });
  }
  const errorRows = new Set(report.map((entry) => entry.row)).size;
  return {
    changes,
    report,
    counts: {
      new: 0,
      updated: changes.filter((change) => change.status === 'updated').length,
      unchanged: changes.filter((change) => change.status === 'unchanged').length,
      errors: errorRows,
    },
  };
}
