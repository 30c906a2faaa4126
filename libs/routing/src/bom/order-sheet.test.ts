import { describe, expect, it } from 'vitest';
import { clamp11_16, fireSleeve, hose6, hoseEnd6, oring906, part } from '../test-support/fixtures.js';
import type { BomRow } from './bom-row.js';
import { buildOrderSheets, saleUnitLabel, taxOf } from './order-sheet.js';

const row = (partId: string | null, quantity: number, unit: BomRow['unit'], extra: Partial<BomRow> = {}): BomRow => ({
  partId,
  kind: 'hose',
  description: partId ?? 'unlisted',
  quantity,
  unit,
  priceCents: null,
  supplierId: null,
  supplierPartNumber: '',
  lineIds: [],
  ...extra,
});

const supplierA = 'supplier-a';
const supplierB = 'supplier-b';
const hose = { ...hose6, supplierId: supplierA, supplierPartNumber: 'H6' };
const end = { ...hoseEnd6, supplierId: supplierA, supplierPartNumber: 'E6' };
const clamps = { ...clamp11_16, supplierId: supplierB, supplierPartNumber: 'C11' };
const sleeve = { ...fireSleeve, supplierId: supplierB, supplierPartNumber: 'S34' };
const seals = { ...oring906, supplierId: null };
const parts = [hose, end, clamps, sleeve, seals];
const noStock = new Map<string, number>();

describe('buildOrderSheets', () => {
  it('sums hose across circuits and rounds up to whole feet (common practice: hose is sold by the whole foot)', () => {
    // Worked example: 39.625 in + 40.125 in (two circuits) = 79.75 in = 6.6458 ft → 7 ft at $9.00/ft = $63.00.
    const { sheets } = buildOrderSheets([row(hose.id, 39.625, 'in'), row(hose.id, 40.125, 'in')], parts, noStock, 0);
    expect(sheets).toHaveLength(1);
    expect(sheets[0].lines[0]).toMatchObject({ partId: hose.id, quantity: 7, unitPriceCents: 900, lineTotalCents: 6300 });
    expect(sheets[0].lines[0].needed).toBeCloseTo(79.75 / 12, 9);
    // Exactly 36 in is 3 ft, not 4: float noise must not push a whole number up.
    const exact = buildOrderSheets([row(hose.id, 12.1, 'in'), row(hose.id, 23.9, 'in')], parts, noStock, 0);
    expect(exact.sheets[0].lines[0].quantity).toBe(3);
  });

  it('rounds pieces up to whole packs (common practice: clamps and O-rings come in packs)', () => {
    // 7 + 6 = 13 clamps in packs of 10 → 2 packs at $6.00 = $12.00; 4 O-rings in packs of 25 → 1 pack.
    const { sheets } = buildOrderSheets(
      [row(clamps.id, 7, 'each', { kind: 'clamp' }), row(clamps.id, 6, 'each', { kind: 'clamp' }), row(seals.id, 4, 'each', { kind: 'seal' })],
      parts,
      noStock,
      0,
    );
    const clampLine = sheets.find((s) => s.supplierId === supplierB)?.lines[0];
    expect(clampLine).toMatchObject({ quantity: 2, lineTotalCents: 1200 });
    expect(saleUnitLabel(clamps.saleUnit)).toBe('pack of 10');
    // Parts without a supplier get their own sheet, last.
    expect(sheets.at(-1)).toMatchObject({ supplierId: null, lines: [{ partId: seals.id, quantity: 1, lineTotalCents: 2000 }] });
  });

  it('takes stock on hand off before rounding, never below zero, and lists what stock covers', () => {
    // Stock is counted in sale units. Hose: need 79.75 in = 6.646 ft, 5 ft on the shelf → 1.646 ft short → 2 ft.
    // Clamps: need 13 = 1.3 packs, 8 loose on the shelf = 0.8 packs → 0.5 short → 1 pack of 10.
    // Hose ends: need 2, 4 on the shelf → nothing to order (covered, not a negative line).
    const stock = new Map([
      [hose.id, 5],
      [clamps.id, 0.8],
      [end.id, 4],
    ]);
    const { sheets, coveredByStock } = buildOrderSheets(
      [row(hose.id, 79.75, 'in'), row(clamps.id, 13, 'each'), row(end.id, 2, 'each')],
      parts,
      stock,
      0,
    );
    const lines = sheets.flatMap((s) => s.lines);
    expect(lines.find((l) => l.partId === hose.id)).toMatchObject({ quantity: 2, stockOnHand: 5 });
    expect(lines.find((l) => l.partId === clamps.id)).toMatchObject({ quantity: 1 });
    expect(lines.find((l) => l.partId === end.id)).toBeUndefined();
    expect(coveredByStock).toEqual([{ partId: end.id, needed: 2, stockOnHand: 4 }]);
    // A negative stock figure counts as none.
    const negative = buildOrderSheets([row(end.id, 2, 'each')], parts, new Map([[end.id, -3]]), 0);
    expect(negative.sheets[0].lines[0]).toMatchObject({ quantity: 2, stockOnHand: 0 });
  });

  it('groups per supplier and totals each sheet with tax at the shop rate', () => {
    // Supplier A: 7 ft hose at $9.00 = $63.00 + 3 hose ends at $12.00 = $36.00 → $99.00.
    // Tax 8.25 %: 9900 × 0.0825 = 816.75 → 817 cents; total 10717 cents.
    // Supplier B: 18 in of sleeve = 1.5 ft → 2 ft at $15.00 = $30.00; tax 247.5 → 248 (half away from zero); total 3248.
    const { sheets } = buildOrderSheets(
      [row(hose.id, 79.75, 'in'), row(end.id, 3, 'each'), row(sleeve.id, 18, 'in', { kind: 'sleeve' })],
      parts,
      noStock,
      8.25,
    );
    expect(sheets.map((s) => s.supplierId)).toEqual([supplierA, supplierB]);
    expect(sheets[0]).toMatchObject({ subtotalCents: 9900, taxCents: 817, totalCents: 10717 });
    expect(sheets[1]).toMatchObject({ subtotalCents: 3000, taxCents: 248, totalCents: 3248 });
    for (const sheet of sheets) {
      expect(sheet.subtotalCents).toBe(sheet.lines.reduce((sum, l) => sum + l.quantity * l.unitPriceCents, 0));
    }
    expect(taxOf(12345, 7)).toBe(864); // 864.15 → 864
  });

  it('reports rows it cannot order: unlisted, unknown, retired, and inches of a part sold each', () => {
    const retired = part({ ...hoseEnd6, id: 'old-end', retired: true });
    const { sheets, unorderable } = buildOrderSheets(
      [row(null, 2, 'each', { description: 'O-ring (not in the catalogue)' }), row('ghost', 1, 'each'), row(retired.id, 1, 'each'), row(end.id, 12, 'in')],
      [...parts, retired],
      noStock,
      0,
    );
    expect(sheets).toEqual([]);
    expect(unorderable.map((u) => u.reason).sort()).toEqual(['not-in-catalogue', 'retired', 'unit-mismatch', 'unknown-part']);
  });
});
