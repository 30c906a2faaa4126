import {
  Button,
  MessageBar,
  MessageBarBody,
  Spinner,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { ArrowDownloadRegular, BoxCheckmarkRegular, MailRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { describeError } from '../../../lib/describe-error';
import { useApiClient } from '../../../lib/useApiClient';
import { useSuppliers } from '../../catalogue/hooks/useSuppliers';
import { formatDateTime } from '../../users/utils/format-date-time';
import { downloadFile } from '../api/download-file';
import { useOrder } from '../hooks/useOrders';
import { supplierOf } from '../utils/supplier-label';
import { OrderLinesTable } from './OrderLinesTable';
import { OrderStatusBadge } from './OrderStatusBadge';
import { OrderTotals } from './OrderTotals';
import { ReceiveDialog } from './ReceiveDialog';
import { SendOrderDialog } from './SendOrderDialog';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  header: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalM },
  actions: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS },
});

/** One supplier's order sheet: lines, totals, export, e-mail and receipts. */
export function OrderPage() {
  const styles = useStyles();
  const { orderId = '' } = useParams();
  const client = useApiClient();
  const order = useOrder(orderId);
  const suppliers = useSuppliers(true).data ?? [];
  const [sending, setSending] = useState(false);
  const [receiving, setReceiving] = useState(false);
  const [exporting, setExporting] = useState(false);
  const [notice, setNotice] = useState<{ intent: 'error' | 'success'; text: string } | null>(null);

  if (order.isPending) return <Spinner label="Loading the order sheet…" />;
  if (order.isError) {
    return (
      <MessageBar intent="error" role="alert">
        <MessageBarBody>The order sheet could not be loaded: {order.error.message}</MessageBarBody>
      </MessageBar>
    );
  }
  const sheet = order.data;
  const supplier = supplierOf(sheet, suppliers);

  async function exportSheet() {
    setExporting(true);
    setNotice(null);
    try {
      const name = await downloadFile(client, `/api/orders/${encodeURIComponent(sheet.id)}/export.xlsx`, `order-${sheet.id}.xlsx`);
      setNotice({ intent: 'success', text: `Saved ${name}.` });
    } catch (cause) {
      setNotice({ intent: 'error', text: describeError(cause, 'The spreadsheet could not be exported.') });
    } finally {
      setExporting(false);
    }
  }

  return (
    <section className={styles.page} aria-labelledby="order-title">
      <Link to="/orders">‹ All order sheets</Link>
      <div className={styles.header}>
        <Text as="h1" id="order-title" size={700} weight="semibold">
          Order sheet · {supplier.name}
        </Text>
        <OrderStatusBadge status={sheet.status} />
      </div>
      <Text>
        Drafted {formatDateTime(sheet.createdAt)}
        {sheet.sentAt ? ` · sent ${formatDateTime(sheet.sentAt)}` : ''}
        {supplier.email ? ` · ${supplier.email}` : ''}
      </Text>
      <div className={styles.actions}>
        <Button icon={exporting ? <Spinner size="tiny" /> : <ArrowDownloadRegular />} disabled={exporting} onClick={() => void exportSheet()}>
          Export .xlsx
        </Button>
        <Button icon={<MailRegular />} disabled={sheet.status !== 'draft' || !sheet.supplierId} onClick={() => setSending(true)}>
          E-mail to supplier
        </Button>
        <Button icon={<BoxCheckmarkRegular />} disabled={sheet.status === 'received'} onClick={() => setReceiving(true)}>
          Receive
        </Button>
      </div>
      {notice && (
        <MessageBar intent={notice.intent} role={notice.intent === 'error' ? 'alert' : 'status'}>
          <MessageBarBody>{notice.text}</MessageBarBody>
        </MessageBar>
      )}
      {sheet.lines.length === 0 ? (
        <Text as="p">Nothing to order: stock on hand covers every part of the chosen circuits.</Text>
      ) : (
        <OrderLinesTable order={sheet} />
      )}
      <OrderTotals order={sheet} />
      {sending && (
        <SendOrderDialog orderId={sheet.id} supplierName={supplier.name} supplierEmail={supplier.email} onClose={() => setSending(false)} />
      )}
      {receiving && <ReceiveDialog order={sheet} onClose={() => setReceiving(false)} />}
    </section>
  );
}
