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
import type { PartRecord } from '../api/part-record-schema';
import { useSavePart } from '../hooks/useSavePart';

export interface RetirePartDialogProps {
  part: PartRecord;
  onClose(): void;
}

/** Retiring keeps the part for the revisions that use it, but stops offering it for new lines. */
export function RetirePartDialog({ part, onClose }: RetirePartDialogProps) {
  const savePart = useSavePart();
  const [error, setError] = useState<string | null>(null);
  const retiring = !part.retired;

  async function confirm() {
    setError(null);
    try {
      await savePart.mutateAsync({ id: part.id, body: { version: part.version, retired: retiring } });
      onClose();
    } catch (cause) {
      setError(describeError(cause, 'The part could not be changed.'));
    }
  }

  return (
    <Dialog open onOpenChange={(_, data) => !data.open && onClose()} modalType="alert">
      <DialogSurface>
        <DialogBody>
          <DialogTitle>{retiring ? `Retire ${part.description}?` : `Bring back ${part.description}?`}</DialogTitle>
          <DialogContent>
            {error && (
              <MessageBar intent="error" role="alert">
                <MessageBarBody>{error}</MessageBarBody>
              </MessageBar>
            )}
            <Text as="p">
              {retiring
                ? 'Retired parts stay on the circuits and orders that already use them, but are no longer offered for new lines or orders. You can bring the part back later.'
                : 'The part will be offered again for new lines and orders.'}
            </Text>
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onClose} disabled={savePart.isPending}>
              Cancel
            </Button>
            <Button
              appearance="primary"
              onClick={() => void confirm()}
              disabled={savePart.isPending}
              icon={savePart.isPending ? <Spinner size="tiny" /> : undefined}
            >
              {retiring ? 'Retire part' : 'Bring back'}
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
