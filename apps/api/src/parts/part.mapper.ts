import type { PartFields } from './dto/part-input.schemas.js';
import type { PartDto } from './dto/part.dto.js';
import type { PartEntity } from './part.entity.js';

/** Rows are validated with the library's `partSchema` on every write, so the stored shape is a Part. */
export function toPartDto(row: PartEntity): PartDto {
  return {
    id: row.id,
    kind: row.kind,
    supplierId: row.supplierId,
    supplierPartNumber: row.supplierPartNumber,
    description: row.description,
    priceCents: row.priceCents,
    saleUnit: row.saleUnit,
    stockOnHand: row.stockOnHand,
    retired: row.retired,
    attributes: row.attributes,
    version: row.version,
  } as PartDto;
}

/** The columns a validated part writes; never the stock on hand, which only stock adjustments change. */
export function toPartColumns(part: PartFields): Partial<PartEntity> {
  return {
    kind: part.kind,
    supplierId: part.supplierId,
    supplierPartNumber: part.supplierPartNumber,
    description: part.description,
    priceCents: part.priceCents,
    saleUnit: part.saleUnit,
    retired: part.retired,
    attributes: part.attributes as Record<string, unknown>,
  };
}
