import {
  Button,
  Checkbox,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  MessageBar,
  MessageBarBody,
  Spinner,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useState } from 'react';
import { describeError } from '../../../lib/describe-error';
import type { Order } from '../api/order-schema';
import { useDraftOrders } from '../hooks/useOrderMutations';
import { useApprovedCircuits } from '../hooks/useOrders';

export interface NewOrderDialogProps {
  onClose(): void;
  onDrafted(orders: Order[]): void;
}

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  list: { display: 'flex', flexDirection: 'column' },
});

/** Pick approved circuits; the API drafts one order sheet per supplier from their parts. */
export function NewOrderDialog({ onClose, onDrafted }: NewOrderDialogProps) {
  const styles = useStyles();
  const approved = useApprovedCircuits(true);
  const draft = useDraftOrders();
  const [selected, setSelected] = useState<string[]>([]);
  const [error, setError] = useState<string | null>(null);

  async function submit() {
    setError(null);
    try {
      onDrafted(await draft.mutateAsync(selected));
    } catch (cause) {
      setError(describeError(cause, 'The order sheets could not be drafted.'));
    }
  }

  return (
    <Dialog open onOpenChange={(_, d) => !d.open && onClose()} modalType="modal">
      <DialogSurface>
        <DialogBody>
          <DialogTitle>New order from approved circuits</DialogTitle>
          <DialogContent className={styles.content}>
            <Text>
              Parts are summed over the chosen circuits, rounded to how each supplier sells them (hose by the foot, clamps by the
              pack), stock on hand is taken off, and one order sheet is drafted per supplier.
            </Text>
            {error && (
              <MessageBar intent="error" role="alert">
                <MessageBarBody>{error}</MessageBarBody>
              </MessageBar>
            )}
            {approved.isPending && <Spinner size="small" label="Looking for approved circuits…" />}
            {approved.isError && <Text role="alert">The circuits could not be loaded: {approved.error.message}</Text>}
            {approved.data && approved.data.length === 0 && (
              <Text>No circuit is approved and waiting for an order. Circuits are approved on the Reviews page.</Text>
            )}
            {approved.data && approved.data.length > 0 && (
              <div className={styles.list} role="group" aria-label="Approved circuits">
                {approved.data.map(({ circuit, buildTitle }) => (
                  <Checkbox
                    key={circuit.id}
                    label={`${buildTitle} · ${circuit.name}`}
                    checked={selected.includes(circuit.id)}
                    onChange={(_, d) =>
                      setSelected((current) => (d.checked ? [...current, circuit.id] : current.filter((id) => id !== circuit.id)))
                    }
                  />
                ))}
              </div>
            )}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onClose} disabled={draft.isPending}>
              Cancel
            </Button>
            <Button
              appearance="primary"
              disabled={selected.length === 0 || draft.isPending}
              icon={draft.isPending ? <Spinner size="tiny" /> : undefined}
              onClick={() => void submit()}
            >
              Draft order sheets
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
