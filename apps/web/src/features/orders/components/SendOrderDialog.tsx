import {
  Button,
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
} from '@fluentui/react-components';
import { useState } from 'react';
import { describeError } from '../../../lib/describe-error';
import { useSendOrder } from '../hooks/useOrderMutations';

export interface SendOrderDialogProps {
  orderId: string;
  supplierName: string;
  supplierEmail: string;
  onClose(): void;
}

/** Confirms the address before the order sheet is e-mailed (with the .xlsx attached). */
export function SendOrderDialog({ orderId, supplierName, supplierEmail, onClose }: SendOrderDialogProps) {
  const send = useSendOrder(orderId);
  const [error, setError] = useState<string | null>(null);

  async function confirm() {
    setError(null);
    try {
      await send.mutateAsync();
      onClose();
    } catch (cause) {
      setError(describeError(cause, 'The order could not be sent.'));
    }
  }

  return (
    <Dialog open onOpenChange={(_, d) => !d.open && onClose()} modalType="alert">
      <DialogSurface>
        <DialogBody>
          <DialogTitle>E-mail the order to {supplierName}?</DialogTitle>
          <DialogContent>
            {error && (
              <MessageBar intent="error" role="alert">
                <MessageBarBody>{error}</MessageBarBody>
              </MessageBar>
            )}
            {supplierEmail ? (
              <Text as="p">
                The order sheet goes to <strong>{supplierEmail}</strong> as a spreadsheet attachment, and the sheet is marked as sent.
              </Text>
            ) : (
              <Text as="p">
                {supplierName} has no order e-mail address. Add one in Catalogue › Suppliers, or export the sheet and send it yourself.
              </Text>
            )}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onClose} disabled={send.isPending}>
              Cancel
            </Button>
            <Button
              appearance="primary"
              disabled={!supplierEmail || send.isPending}
              icon={send.isPending ? <Spinner size="tiny" /> : undefined}
              onClick={() => void confirm()}
            >
              Send order
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
