import {
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
} from '@fluentui/react-components';
import { formatMoney } from '../../circuits/utils/format-money';
import type { Order } from '../api/order-schema';

const useStyles = makeStyles({
  number: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
});

const quantityFormat = new Intl.NumberFormat(undefined, { maximumFractionDigits: 3 });

/** The sheet's lines exactly as the API computed them: the client never re-adds money. */
export function OrderLinesTable({ order }: { order: Order }) {
  const styles = useStyles();
  return (
    <Table size="small" aria-label="Order lines">
      <TableHeader>
        <TableRow>
          <TableHeaderCell>Part number</TableHeaderCell>
          <TableHeaderCell>Description</TableHeaderCell>
          <TableHeaderCell className={styles.number}>Quantity</TableHeaderCell>
          <TableHeaderCell>Sale unit</TableHeaderCell>
          <TableHeaderCell className={styles.number}>Unit price</TableHeaderCell>
          <TableHeaderCell className={styles.number}>Line total</TableHeaderCell>
          <TableHeaderCell className={styles.number}>Received</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {order.lines.map((line) => (
          <TableRow key={line.id}>
            <TableCell>{line.supplierPartNumber || '—'}</TableCell>
            <TableCell>{line.description}</TableCell>
            <TableCell className={styles.number}>{quantityFormat.format(line.quantity)}</TableCell>
            <TableCell>{line.saleUnit}</TableCell>
            <TableCell className={styles.number}>{formatMoney(line.unitPriceCents)}</TableCell>
            <TableCell className={styles.number}>{formatMoney(line.lineTotalCents)}</TableCell>
            <TableCell className={styles.number}>{quantityFormat.format(line.receivedQuantity)}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
