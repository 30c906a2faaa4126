import {
  Badge,
  Button,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { ArchiveRegular, BoxRegular, EditRegular } from '@fluentui/react-icons';
import { formatMoney } from '../../circuits/utils/format-money';
import type { PartRecord } from '../api/part-record-schema';
import type { Supplier } from '../api/supplier-schema';
import { formatSaleUnit } from '../utils/format-sale-unit';
import { partKindLabels } from '../utils/part-kind-labels';

export interface PartsTableProps {
  parts: readonly PartRecord[];
  suppliers: readonly Supplier[];
  canEdit: boolean;
  onEdit(part: PartRecord): void;
  onStock(part: PartRecord): void;
  onRetire(part: PartRecord): void;
}

const useStyles = makeStyles({
  number: { textAlign: 'end', fontVariantNumeric: 'tabular-nums' },
  actions: { display: 'flex', gap: tokens.spacingHorizontalXS },
});

export function PartsTable({ parts, suppliers, canEdit, onEdit, onStock, onRetire }: PartsTableProps) {
  const styles = useStyles();
  const supplierName = new Map(suppliers.map((s) => [s.id, s.name]));
  return (
    <Table size="small" aria-label="Parts">
      <TableHeader>
        <TableRow>
          <TableHeaderCell>Description</TableHeaderCell>
          <TableHeaderCell>Kind</TableHeaderCell>
          <TableHeaderCell>Part number</TableHeaderCell>
          <TableHeaderCell>Supplier</TableHeaderCell>
          <TableHeaderCell className={styles.number}>Price</TableHeaderCell>
          <TableHeaderCell>Sale unit</TableHeaderCell>
          <TableHeaderCell className={styles.number}>On hand</TableHeaderCell>
          <TableHeaderCell>Actions</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {parts.map((part) => (
          <TableRow key={part.id}>
            <TableCell>
              {part.description}{' '}
              {part.retired && (
                <Badge appearance="outline" color="subtle">
                  retired
                </Badge>
              )}
            </TableCell>
            <TableCell>{partKindLabels[part.kind]}</TableCell>
            <TableCell>{part.supplierPartNumber || '—'}</TableCell>
            <TableCell>{(part.supplierId && supplierName.get(part.supplierId)) || '—'}</TableCell>
            <TableCell className={styles.number}>{formatMoney(part.priceCents)}</TableCell>
            <TableCell>{formatSaleUnit(part.saleUnit)}</TableCell>
            <TableCell className={styles.number}>{part.stockOnHand}</TableCell>
            <TableCell>
              <div className={styles.actions}>
                <Button size="small" icon={<BoxRegular />} onClick={() => onStock(part)} aria-label={`Stock of ${part.description}`}>
                  Stock
                </Button>
                {canEdit && (
                  <>
                    <Button size="small" icon={<EditRegular />} onClick={() => onEdit(part)} aria-label={`Edit ${part.description}`}>
                      Edit
                    </Button>
                    <Button size="small" icon={<ArchiveRegular />} onClick={() => onRetire(part)} aria-label={`${part.retired ? 'Bring back' : 'Retire'} ${part.description}`}>
                      {part.retired ? 'Bring back' : 'Retire'}
                    </Button>
                  </>
                )}
              </div>
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
