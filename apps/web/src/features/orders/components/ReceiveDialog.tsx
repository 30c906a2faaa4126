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
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useState } from 'react';
import { describeError } from '../../../lib/describe-error';
import { newIdempotencyKey } from '../../../lib/idempotency-key';
import type { Order } from '../api/order-schema';
import { useReceiveOrder } from '../hooks/useOrderMutations';
import { outstanding, receiveInputOf } from '../utils/receive-form';

export interface ReceiveDialogProps {
  order: Order;
  onClose(): void;
}

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  line: { display: 'grid', gridTemplateColumns: '1fr 140px', alignItems: 'end', gap: tokens.spacingHorizontalM },
});

/** Books a delivery into stock: per line, how many arrived (pre-filled with what is still to come). */
export function ReceiveDialog({ order, onClose }: ReceiveDialogProps) {
  const styles = useStyles();
  const receive = useReceiveOrder(order.id);
  const open = order.lines.filter((line) => outstanding(line) > 0);
  const [typed, setTyped] = useState<Record<string, string>>(
    Object.fromEntries(open.map((line) => [line.id, String(outstanding(line))])),
  );
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);
  // This dialog books one receipt: every attempt at it carries the same key.
  const [idempotencyKey] = useState(newIdempotencyKey);

  async function confirm() {
    setError(null);
    const checked = receiveInputOf(open, typed);
    if (!checked.ok) {
      setErrors(checked.errors);
      return;
    }
    setErrors({});
    try {
      await receive.mutateAsync({ input: checked.input, idempotencyKey });
      onClose();
    } catch (cause) {
      setError(describeError(cause, 'The delivery could not be booked in.'));
    }
  }

  return (
    <Dialog open onOpenChange={(_, d) => !d.open && onClose()} modalType="modal">
      <DialogSurface>
        <DialogBody>
          <DialogTitle>Book a delivery into stock</DialogTitle>
          <DialogContent className={styles.content}>
            {(error ?? errors.form) && (
              <MessageBar intent="error" role="alert">
                <MessageBarBody>{error ?? errors.form}</MessageBarBody>
              </MessageBar>
            )}
            {open.length === 0 && <Text>Everything on this sheet has arrived.</Text>}
            {open.map((line) => (
              <div key={line.id} className={styles.line}>
                <Text>
                  {line.description} ({outstanding(line)} {line.saleUnit} to come)
                </Text>
                <Field label={`Arrived: ${line.description}`} validationMessage={errors[line.id]}>
                  <Input
                    inputMode="decimal"
                    value={typed[line.id] ?? ''}
                    onChange={(_, d) => setTyped((current) => ({ ...current, [line.id]: d.value }))}
                  />
                </Field>
              </div>
            ))}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onClose} disabled={receive.isPending}>
              Cancel
            </Button>
            <Button
              appearance="primary"
              disabled={open.length === 0 || receive.isPending}
              icon={receive.isPending ? <Spinner size="tiny" /> : undefined}
              onClick={() => void confirm()}
            >
              Book into stock
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
