import type { Supplier } from '../../catalogue/api/supplier-schema';
import type { Order } from '../api/order-schema';

/** The supplier of an order sheet by name; parts without a supplier share one sheet. */
export function supplierOf(order: Order, suppliers: readonly Supplier[]): { name: string; email: string } {
  const known = order.supplierId ? suppliers.find((s) => s.id === order.supplierId) : undefined;
  if (order.supplier) return { name: order.supplier.name, email: order.supplier.email ?? known?.email ?? '' };
  if (known) return { name: known.name, email: known.email };
  if (order.supplierName) return { name: order.supplierName, email: '' };
  return { name: order.supplierId ? 'Unknown supplier' : 'No supplier yet', email: '' };
}
