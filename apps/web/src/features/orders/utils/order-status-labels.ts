import type { OrderStatus } from '../api/order-schema';

export const orderStatusLabels: Record<OrderStatus, string> = {
  draft: 'Draft',
  sent: 'Sent',
  'partially-received': 'Partly received',
  received: 'Received',
};
