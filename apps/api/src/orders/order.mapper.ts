import type { OrderDto, OrderLineDto, OrderSupplierDto } from './dto/order.schemas.js';
import type { OrderLineEntity } from './order-line.entity.js';
import type { OrderEntity } from './order.entity.js';

export function toOrderLineDto(line: OrderLineEntity): OrderLineDto {
  return {
    id: line.id,
    partId: line.partId,
    description: line.description,
    supplierPartNumber: line.supplierPartNumber,
    saleUnit: line.saleUnit,
    quantity: line.quantity,
    unitPriceCents: line.unitPriceCents,
    lineTotalCents: line.lineTotalCents,
    receivedQuantity: line.receivedQuantity,
  };
}

export function toOrderDto(order: OrderEntity, lines: readonly OrderLineEntity[], supplier: OrderSupplierDto | null): OrderDto {
  return {
    id: order.id,
    supplierId: order.supplierId,
    supplier,
    supplierName: supplier?.name ?? null,
    status: order.status,
    circuitIds: order.circuitIds,
    taxRatePercent: order.taxRatePercent,
    subtotalCents: order.subtotalCents,
    taxCents: order.taxCents,
    totalCents: order.totalCents,
    sentAt: order.sentAt?.toISOString() ?? null,
    version: order.version,
    createdAt: order.createdAt.toISOString(),
    updatedAt: order.updatedAt.toISOString(),
    lines: [...lines].sort((a, b) => a.position - b.position).map(toOrderLineDto),
  };
}

