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
} from '@fluentui/react-components';
import { useState } from 'react';
import type { Upload } from '../api/upload-schema';
import { useDeleteUpload } from '../hooks/useDeleteUpload';

export interface DeletePhotoDialogProps {
  buildId: string;
  upload: Upload;
  onClose(): void;
}

export function DeletePhotoDialog({ buildId, upload, onClose }: DeletePhotoDialogProps) {
  const deleteUpload = useDeleteUpload(buildId);
  const [error, setError] = useState<string | null>(null);

  async function confirm() {
    setError(null);
    try {
      await deleteUpload.mutateAsync(upload.id);
      onClose();
    } catch (cause) {
      setError(cause instanceof Error ? cause.message : 'The photo could not be deleted.');
    }
  }

  return (
    <Dialog open onOpenChange={(_, data) => !data.open && onClose()} modalType="alert">
      <DialogSurface>
        <DialogBody>
          <DialogTitle>Delete {upload.fileName}?</DialogTitle>
          <DialogContent>
            <p>The photo is removed from this build. A circuit sketch drawn over it loses its background.</p>
            {error && (
              <MessageBar intent="error" role="alert">
                <MessageBarBody>{error}</MessageBarBody>
              </MessageBar>
            )}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onClose} disabled={deleteUpload.isPending}>
              Cancel
            </Button>
            <Button
              appearance="primary"
              onClick={() => void confirm()}
              disabled={deleteUpload.isPending}
              icon={deleteUpload.isPending ? <Spinner size="tiny" /> : undefined}
            >
              Delete
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
