import type { PartKind } from '@linesmith/catalog';

/** One row of a circuit's bill of materials. */
export interface BomRow {
  /** Null for a seal, clamp or sleeve the circuit needs but the catalogue has no part for (or none picked). */
  partId: string | null;
  kind: PartKind;
  description: string;
  quantity: number;
  unit: 'in' | 'each';
  /** Row total in cents; null when the part's sale unit cannot price this quantity (e.g. inches of a part sold each). */
  priceCents: number | null;
  supplierId: string | null;
  supplierPartNumber: string;
  /** Lines that use this row. */
  lineIds: string[];
  /** For hose: how many cuts the quantity covers. */
  cuts?: number;
}

export interface BillOfMaterials {
  rows: BomRow[];
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  /** Rows that could not be priced. */
  unpricedRows: number;
}
