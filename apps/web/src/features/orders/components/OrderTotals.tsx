import { makeStyles, tokens } from '@fluentui/react-components';
import { formatMoney } from '../../circuits/utils/format-money';
import type { Order } from '../api/order-schema';

const useStyles = makeStyles({
  list: {
    display: 'grid',
    gridTemplateColumns: 'auto auto',
    justifyContent: 'end',
    columnGap: tokens.spacingHorizontalXXL,
    rowGap: tokens.spacingVerticalXS,
    margin: 0,
  },
  value: { margin: 0, textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  strong: { fontWeight: tokens.fontWeightSemibold },
});

/** Subtotal, tax and total as the API computed them when the sheet was drafted. */
export function OrderTotals({ order }: { order: Order }) {
  const styles = useStyles();
  return (
    <dl className={styles.list} aria-label="Order totals">
      <dt>Subtotal</dt>
      <dd className={styles.value}>{formatMoney(order.subtotalCents)}</dd>
      <dt>Tax ({order.taxRatePercent} %)</dt>
      <dd className={styles.value}>{formatMoney(order.taxCents)}</dd>
      <dt className={styles.strong}>Total</dt>
      <dd className={`${styles.value} ${styles.strong}`}>{formatMoney(order.totalCents)}</dd>
    </dl>
  );
}
