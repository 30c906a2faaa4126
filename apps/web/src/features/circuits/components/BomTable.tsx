import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, makeStyles, tokens } from '@fluentui/react-components';
import { formatLength, type LengthUnit } from '@linesmith/routing';
import type { CircuitCheck } from '../api/check-schema';
import { formatMoney } from '../utils/format-money';

export interface BomTableProps {
  bom: CircuitCheck['bom'];
  lengthUnit: LengthUnit;
}

const useStyles = makeStyles({
  number: { textAlign: 'right', whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' },
  total: { fontWeight: tokens.fontWeightSemibold },
});

/** The circuit's bill of materials: each part once, hose by length, the rest by count. */
export function BomTable({ bom, lengthUnit }: BomTableProps) {
  const styles = useStyles();
  return (
    <Table size="small" aria-label="Parts">
      <TableHeader>
        <TableRow>
          <TableHeaderCell>Part</TableHeaderCell>
          <TableHeaderCell>Kind</TableHeaderCell>
          <TableHeaderCell>Supplier part number</TableHeaderCell>
          <TableHeaderCell className={styles.number}>Quantity</TableHeaderCell>
          <TableHeaderCell className={styles.number}>Price</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {bom.rows.map((row, index) => (
          <TableRow key={row.partId ?? `unlisted-${index}`}>
            <TableCell>{row.partId === null ? `${row.description} (not in the catalogue)` : row.description}</TableCell>
            <TableCell>{row.kind}</TableCell>
            <TableCell>{row.supplierPartNumber || '—'}</TableCell>
            <TableCell className={styles.number}>
              {row.unit === 'in'
                ? `${formatLength(row.quantity, lengthUnit)}${row.cuts ? ` (${row.cuts} ${row.cuts === 1 ? 'cut' : 'cuts'})` : ''}`
                : row.quantity}
            </TableCell>
            <TableCell className={styles.number}>{row.priceCents === null ? 'Not priced' : formatMoney(row.priceCents)}</TableCell>
          </TableRow>
        ))}
        <TableRow className={styles.total}>
          <TableCell colSpan={4}>Subtotal{bom.unpricedRows > 0 ? ` (${bom.unpricedRows} rows not priced)` : ''}</TableCell>
          <TableCell className={styles.number}>{formatMoney(bom.subtotalCents)}</TableCell>
        </TableRow>
        <TableRow className={styles.total}>
          <TableCell colSpan={4}>Tax</TableCell>
          <TableCell className={styles.number}>{formatMoney(bom.taxCents)}</TableCell>
        </TableRow>
        <TableRow className={styles.total}>
          <TableCell colSpan={4}>Total</TableCell>
          <TableCell className={styles.number}>{formatMoney(bom.totalCents)}</TableCell>
        </TableRow>
      </TableBody>
    </Table>
  );
}
