import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  Field,
  Input,
  MessageBar,
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
import { useState, type FormEvent } from 'react';
import { describeError } from '../../../lib/describe-error';
import { fieldErrors } from '../../../lib/field-errors';
import { formatDateTime } from '../../users/utils/format-date-time';
import type { PartRecord } from '../api/part-record-schema';
import { useAdjustStock } from '../hooks/useAdjustStock';
import { useStockHistory } from '../hooks/useStockHistory';
import { formatSaleUnit } from '../utils/format-sale-unit';
import { stockAdjustmentFormSchema, type StockAdjustmentFormValues } from '../utils/stock-adjustment-form-schema';

export interface StockDialogProps {
  part: PartRecord;
  canAdjust: boolean;
  onClose(): void;
}

const useStyles = makeStyles({
  surface: { maxWidth: '680px', width: '100%' },
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  form: { display: 'grid', gridTemplateColumns: '1fr 2fr auto', alignItems: 'end', gap: tokens.spacingHorizontalS },
  history: { maxHeight: '280px', overflowY: 'auto' },
});

/** Stock on hand of one part, its adjustment history, and a new adjustment (always with a reason). */
export function StockDialog({ part, canAdjust, onClose }: StockDialogProps) {
  const styles = useStyles();
  const history = useStockHistory(part.id);
  const adjust = useAdjustStock(part.id);
  const [values, setValues] = useState<StockAdjustmentFormValues>({ delta: '', reason: '' });
  const [errors, setErrors] = useState<Partial<Record<keyof StockAdjustmentFormValues, string>>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [onHand, setOnHand] = useState(part.stockOnHand);

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFormError(null);
    const parsed = stockAdjustmentFormSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrors<keyof StockAdjustmentFormValues>(parsed.error.issues));
      return;
    }
    setErrors({});
    try {
      await adjust.mutateAsync(parsed.data);
      setOnHand((n) => n + parsed.data.delta);
      setValues({ delta: '', reason: '' });
      void history.refetch();
    } catch (error) {
      setFormError(describeError(error, 'The stock could not be adjusted.'));
    }
  }

  return (
    <Dialog open onOpenChange={(_, data) => !data.open && onClose()} modalType="modal">
      <DialogSurface className={styles.surface}>
        <DialogBody>
          <DialogTitle>Stock of {part.description}</DialogTitle>
          <DialogContent className={styles.content}>
            <Text>
              On hand: <strong>{onHand}</strong> ({formatSaleUnit(part.saleUnit)})
            </Text>
            {canAdjust && (
              <form className={styles.form} onSubmit={handleSubmit} noValidate aria-label="Adjust stock">
                <Field label="Change" required validationMessage={errors.delta}>
                  <Input inputMode="decimal" value={values.delta} onChange={(_, d) => setValues((v) => ({ ...v, delta: d.value }))} />
                </Field>
                <Field label="Reason" required validationMessage={errors.reason}>
                  <Input value={values.reason} onChange={(_, d) => setValues((v) => ({ ...v, reason: d.value }))} />
                </Field>
                <Button type="submit" appearance="primary" disabled={adjust.isPending} icon={adjust.isPending ? <Spinner size="tiny" /> : undefined}>
                  Adjust stock
                </Button>
              </form>
            )}
            {formError && (
              <MessageBar intent="error" role="alert">
                <MessageBarBody>{formError}</MessageBarBody>
              </MessageBar>
            )}
            <Text weight="semibold">History</Text>
            {history.isPending && <Spinner size="small" label="Loading the history…" />}
            {history.isError && <Text>The history could not be loaded: {history.error.message}</Text>}
            {history.data && history.data.length === 0 && <Text>No adjustments yet.</Text>}
            {history.data && history.data.length > 0 && (
              <div className={styles.history}>
                <Table size="small" aria-label="Stock history">
                  <TableHeader>
                    <TableRow>
                      <TableHeaderCell>When</TableHeaderCell>
                      <TableHeaderCell>Change</TableHeaderCell>
                      <TableHeaderCell>Reason</TableHeaderCell>
                      <TableHeaderCell>By</TableHeaderCell>
                    </TableRow>
                  </TableHeader>
                  <TableBody>
                    {history.data.map((entry, index) => (
                      <TableRow key={`${entry.createdAt}-${index}`}>
                        <TableCell>{formatDateTime(entry.createdAt)}</TableCell>
                        <TableCell>{entry.delta > 0 ? `+${entry.delta}` : entry.delta}</TableCell>
                        <TableCell>{entry.reason}</TableCell>
                        <TableCell>{entry.actor?.displayName ?? '—'}</TableCell>
                      </TableRow>
                    ))}
                  </TableBody>
                </Table>
              </div>
            )}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onClose}>
              Close
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
