import { Badge } from '@fluentui/react-components';
import type { OrderStatus } from '../api/order-schema';
import { orderStatusLabels } from '../utils/order-status-labels';

const colors = { draft: 'informative', sent: 'brand', 'partially-received': 'warning', received: 'success' } as const;

export function OrderStatusBadge({ status }: { status: OrderStatus }) {
  return (
    <Badge appearance="tint" color={colors[status]}>
      {orderStatusLabels[status]}
    </Badge>
  );
}
