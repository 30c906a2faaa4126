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
import { describeError } from '../../../lib/describe-error';
import { useState } from 'react';
import { conflictCurrentUser } from '../api/conflict-current-user';
import type { User } from '../api/user-schema';
import { useUpdateUser } from '../hooks/useUpdateUser';
import { ConflictNotice } from './ConflictNotice';

export interface SetActiveDialogProps {
  user: User;
  onClose(): void;
}

/** Confirms deactivating (or reactivating) a user; a stale row is shown and can be retried. */
export function SetActiveDialog({ user, onClose }: SetActiveDialogProps) {
  const updateUser = useUpdateUser();
  const activate = !user.active;
  const [conflict, setConflict] = useState<User | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const alreadyDone = conflict !== null && conflict.active === activate;

  async function confirm() {
    setFormError(null);
    try {
      await updateUser.mutateAsync({ id: user.id, changes: { version: (conflict ?? user).version, active: activate } });
      onClose();
    } catch (error) {
      const current = conflictCurrentUser(error);
      if (current) setConflict(current);
      else setFormError(describeError(error, 'The change could not be saved.'));
    }
  }

  const verb = activate ? 'Reactivate' : 'Deactivate';
  return (
    <Dialog open onOpenChange={(_, data) => !data.open && onClose()} modalType="alert">
      <DialogSurface>
        <DialogBody>
          <DialogTitle>
            {verb} {user.displayName}?
          </DialogTitle>
          <DialogContent>
            <p>
              {activate
                ? `${user.displayName} will be able to sign in again with the roles shown in the list.`
                : `${user.displayName} will no longer be able to sign in. Their builds, reviews and orders stay in the shop's records.`}
            </p>
            {conflict && <ConflictNotice current={conflict} />}
            {alreadyDone && (
              <MessageBar intent="info">
                <MessageBarBody>The user is already {activate ? 'active' : 'inactive'}; nothing is left to do.</MessageBarBody>
              </MessageBar>
            )}
            {formError && (
              <MessageBar intent="error" role="alert">
                <MessageBarBody>{formError}</MessageBarBody>
              </MessageBar>
            )}
          </DialogContent>
          <DialogActions>
            {/* First in order, so the dialog opens with focus on the harmless choice. */}
            <Button appearance="secondary" onClick={onClose} disabled={updateUser.isPending}>
              {alreadyDone ? 'Close' : 'Cancel'}
            </Button>
            {!alreadyDone && (
              <Button
                appearance="primary"
                onClick={() => void confirm()}
                disabled={updateUser.isPending}
                icon={updateUser.isPending ? <Spinner size="tiny" /> : undefined}
              >
                {conflict ? `Retry: ${verb.toLowerCase()}` : verb}
              </Button>
            )}
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
