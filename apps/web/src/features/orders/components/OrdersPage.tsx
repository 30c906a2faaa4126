import {
  Button,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  Spinner,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { AddRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { useSuppliers } from '../../catalogue/hooks/useSuppliers';
import { formatMoney } from '../../circuits/utils/format-money';
import { formatDateTime } from '../../users/utils/format-date-time';
import { useOrdersList } from '../hooks/useOrders';
import { supplierOf } from '../utils/supplier-label';
import { NewOrderDialog } from './NewOrderDialog';
import { OrderStatusBadge } from './OrderStatusBadge';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  header: { display: 'flex', alignItems: 'center', justifyContent: 'space-between' },
  number: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
});

/** Orders: the order sheets per supplier, newest first, and new sheets from approved circuits. */
export function OrdersPage() {
  const styles = useStyles();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  const orders = useOrdersList();
  const suppliers = useSuppliers(true).data ?? [];

  return (
    <section className={styles.page} aria-labelledby="orders-title">
      <div className={styles.header}>
        <Text as="h1" id="orders-title" size={700} weight="semibold">
          Orders
        </Text>
        <Button appearance="primary" icon={<AddRegular />} onClick={() => setCreating(true)}>
          New order
        </Button>
      </div>
      {orders.isPending && <Spinner label="Loading order sheets…" />}
      {orders.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The order sheets could not be loaded: {orders.error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void orders.refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {orders.data && orders.data.length === 0 && (
        <Text as="p">No order sheets yet. Start one from approved circuits with &quot;New order&quot;.</Text>
      )}
      {orders.data && orders.data.length > 0 && (
        <Table size="small" aria-label="Order sheets">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Supplier</TableHeaderCell>
              <TableHeaderCell>Status</TableHeaderCell>
              <TableHeaderCell>Drafted</TableHeaderCell>
              <TableHeaderCell>Sent</TableHeaderCell>
              <TableHeaderCell className={styles.number}>Total</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {orders.data.map((order) => (
              <TableRow key={order.id}>
                <TableCell>
                  <Link to={`/orders/${order.id}`}>{supplierOf(order, suppliers).name}</Link>
                </TableCell>
                <TableCell>
                  <OrderStatusBadge status={order.status} />
                </TableCell>
                <TableCell>{formatDateTime(order.createdAt)}</TableCell>
                <TableCell>{order.sentAt ? formatDateTime(order.sentAt) : '—'}</TableCell>
                <TableCell className={styles.number}>{formatMoney(order.totalCents)}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
      {creating && (
        <NewOrderDialog
          onClose={() => setCreating(false)}
          onDrafted={(drafted) => {
            setCreating(false);
            if (drafted.length === 1) navigate(`/orders/${drafted[0].id}`);
          }}
        />
      )}
    </section>
  );
}
