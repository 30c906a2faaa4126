import { demoParts } from '@linesmith/catalog';
import { checkPriceList, parsePriceCents, parseSaleUnit } from './check-price-list.js';
import { guessMapping } from './column-mapping.js';

const clamp = { ...demoParts.find((part) => part.kind === 'clamp')!, version: 3 };

describe('price-list rows', () => {
  it('reads prices as cents only when they are plain non-negative amounts with at most 2 decimals', () => {
    expect(parsePriceCents(12.5)).toBe(1250);
    expect(parsePriceCents('$1,234.50')).toBe(123450);
    expect(parsePriceCents('0.1')).toBe(10);
    // 0.1 + 0.2 is 0.30000000000000004 in IEEE 754 doubles: still 30 cents.
    expect(parsePriceCents(0.1 + 0.2)).toBe(30);
    // Decimal commas of lists from other locales; "1,234" stays one thousand two hundred thirty-four.
    expect(parsePriceCents('12,50')).toBe(1250);
    expect(parsePriceCents('1.234,5')).toBe(123450);
    expect(parsePriceCents('1,234')).toBe(123400);
    for (const bad of [-1, '12.345', 'twelve', '', null, Number.NaN, '1,23.00']) expect(parsePriceCents(bad as never)).toBeUndefined();
  });

  it('reads sale units in the usual spellings, with the pack size from its column or the text', () => {
    expect(parseSaleUnit('EA', null)).toEqual({ type: 'each' });
    expect(parseSaleUnit('ft', null)).toEqual({ type: 'foot' });
    expect(parseSaleUnit('pack', '10')).toEqual({ type: 'pack', size: 10 });
    expect(parseSaleUnit('Pack of 25', null)).toEqual({ type: 'pack', size: 25 });
    expect(typeof parseSaleUnit('pack', null)).toBe('string');
    expect(typeof parseSaleUnit('gallon', null)).toBe('string');
  });

  it('guesses a mapping from common header words, each header used once', () => {
    expect(guessMapping(['Item #', 'Item description', 'List price', 'Sold by', 'Qty per pack'])).toEqual({
      partNumber: 'Item #',
      description: 'Item description',
      price: 'List price',
      saleUnit: 'Sold by',
      packSize: 'Qty per pack',
    });
  });

  it('marks unchanged rows, carries the version it saw and counts error rows once', () => {
    const sheet = {
      headers: ['PN', 'Price', 'Unit'],
      rows: [
        { row: 2, cells: [clamp.supplierPartNumber, clamp.priceCents / 100, 'pack of 10'] },
        { row: 3, cells: [null, 'x', 'gallon'] },
      ],
    };
    const check = checkPriceList(sheet, { partNumber: 0, price: 1, saleUnit: 2 }, sheet.headers, [clamp]);
    expect(check.changes).toEqual([expect.objectContaining({ row: 2, partId: clamp.id, partVersion: 3, status: 'unchanged' })]);
    expect(check.report.map((issue) => issue.column)).toEqual(['PN', 'Price', 'Unit']);
    expect(check.counts).toEqual({ new: 0, updated: 0, unchanged: 1, errors: 1 });
  });

  it('refuses a new sale unit on the row of a part with stock on hand, and takes it at zero stock', () => {
    const sheet = { headers: ['PN', 'Price', 'Unit'], rows: [{ row: 2, cells: [clamp.supplierPartNumber, 1.25, 'each'] }] };
    const stocked = checkPriceList(sheet, { partNumber: 0, price: 1, saleUnit: 2 }, sheet.headers, [{ ...clamp, stockOnHand: 4 }]);
    expect(stocked.changes).toEqual([]);
    expect(stocked.report).toEqual([{ row: 2, column: 'Unit', message: expect.stringMatching(/4 pack\(s\) of 10 are on hand/) }]);
    const empty = checkPriceList(sheet, { partNumber: 0, price: 1, saleUnit: 2 }, sheet.headers, [{ ...clamp, stockOnHand: 0 }]);
    expect(empty.report).toEqual([]);
    expect(empty.changes).toEqual([expect.objectContaining({ saleUnit: { type: 'each' }, status: 'updated' })]);
  });
});
