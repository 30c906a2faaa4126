import { z } from 'zod';
import { zodDto } from '../../common/validation/zod-dto.js';
import type { OrderStatus } from '../order-status.js';
import { positiveQuantitySchema } from '../../common/validation/numbers.js';

export const draftOrdersSchema = z.object({
  circuitIds: z
    .array(z.uuid('Give the ids of approved circuits.'))
    .min(1, 'Choose at least one approved circuit.')
    .max(200)
    .transform((ids) => [...new Set(ids)]),
});
export class DraftOrdersDto extends zodDto(draftOrdersSchema) {}

export const receiveOrderSchema = z.object({
  lines: z
    .array(
      z.object({
        orderLineId: z.uuid(),
        /** Sale units received now (feet, pieces or packs, as ordered). */
        quantity: positiveQuantitySchema,
      }),
    )
    .min(1, 'Enter at least one received line.'),
});
export class ReceiveOrderDto extends zodDto(receiveOrderSchema) {}

/**
 * The `Idempotency-Key` request header of a receipt (IETF draft-ietf-httpapi-idempotency-key-header):
 * the web app sends a fresh one per click, so a retried or doubled submit is booked once.
 */
export const idempotencyKeySchema = z
  .string()
  .trim()
  .min(1)
  .max(200, 'An Idempotency-Key has at most 200 characters.')
  .regex(/^[\x21-\x7e]+$/, 'An Idempotency-Key uses visible ASCII characters only.')
  .optional();
export type ReceiveOrderInput = z.output<typeof receiveOrderSchema>;

export interface OrderLineDto {
  id: string;
  partId: string | null;
  description: string;
  supplierPartNumber: string;
  saleUnit: string;
  quantity: number;
  unitPriceCents: number;
  lineTotalCents: number;
  receivedQuantity: number;
}

/** Where the order goes: shown so the clerk can confirm the address before sending. */
export interface OrderSupplierDto {
  id: string;
  name: string;
  email: string;
  accountNumber: string;
}

export interface OrderDto {
  id: string;
  supplierId: string | null;
  supplier: OrderSupplierDto | null;
  supplierName: string | null;
  status: OrderStatus;
  circuitIds: string[];
  taxRatePercent: number;
  subtotalCents: number;
  taxCents: number;
  totalCents: number;
  sentAt: string | null;
  version: number;
  createdAt: string;
  updatedAt: string;
  lines: OrderLineDto[];
}

export interface DraftOrdersResult {
  orders: OrderDto[];
  /** Parts the circuits need that stock on hand already covers. */
  coveredByStock: Array<{ partId: string; needed: number; stockOnHand: number }>;
  /** Bill-of-materials rows that could not be ordered (no catalogue part, retired, …). */
  unorderable: Array<{ partId: string | null; description: string; reason: string }>;
  /** True when these revisions were already drafted (a repeated submit): the orders are the earlier ones. */
  reused: boolean;
}
