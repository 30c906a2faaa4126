import { saleUnitSchema } from '@linesmith/catalog';
import { z } from 'zod';
import { formatSaleUnit } from '../../catalogue/utils/format-sale-unit';

export const orderStatusSchema = z.enum(['draft', 'sent', 'partially-received', 'received']);
export type OrderStatus = z.infer<typeof orderStatusSchema>;

/** "foot", "pack of 10", or the catalogue's sale unit object: shown as the API words it. */
const saleUnitText = z.union([z.string(), saleUnitSchema.transform(formatSaleUnit)]);

/** One line of an order sheet. Quantities are in sale units; money in cents, as the API computed it. */
export const orderLineSchema = z
  .looseObject({
    id: z.string().min(1),
    partId: z.string().nullish(),
    description: z.string(),
    supplierPartNumber: z.string().nullish().transform((v) => v ?? ''),
    saleUnit: saleUnitText,
    quantity: z.number(),
    unitPriceCents: z.number().int(),
    lineTotalCents: z.number().int(),
    receivedQuantity: z.number().optional(),
    received: z.number().optional(),
  })
  .transform(({ receivedQuantity, received, partId, ...line }) => ({
    ...line,
    partId: partId ?? null,
    receivedQuantity: receivedQuantity ?? received ?? 0,
  }));
export type OrderLine = z.output<typeof orderLineSchema>;

const supplierRefSchema = z.object({ id: z.string(), name: z.string(), email: z.string().nullish() });

/** One supplier's order sheet (`GET /api/orders/:id`; the list may leave `lines` out). */
export const orderSchema = z.looseObject({
  id: z.string().min(1),
  supplierId: z.string().nullish().transform((v) => v ?? null),
  supplier: supplierRefSchema.nullish().transform((v) => v ?? null),
  supplierName: z.string().nullish().transform((v) => v ?? null),
  status: orderStatusSchema,
  circuitIds: z.array(z.string()).default([]),
  taxRatePercent: z.number().default(0),
  subtotalCents: z.number().int(),
  taxCents: z.number().int(),
  totalCents: z.number().int(),
  sentAt: z.iso.datetime({ offset: true }).nullish(),
  version: z.number().int().optional(),
  createdAt: z.iso.datetime({ offset: true }),
  lines: z.array(orderLineSchema).default([]),
});
export type Order = z.output<typeof orderSchema>;

export const orderListSchema = z.union([
  z.array(orderSchema),
  z.looseObject({ items: z.array(orderSchema) }).transform((page) => page.items),
]);

/** `POST /api/orders/draft` answers the new sheets, bare or under `orders`. */
export const draftOrdersSchema = z.union([
  z.array(orderSchema),
  z.looseObject({ orders: z.array(orderSchema) }).transform((body) => body.orders),
]);

export interface ReceiveInput {
  lines: { orderLineId: string; quantity: number }[];
}
