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
import { useState, type FormEvent } from 'react';
import { ApiError } from '../../../lib/api-error';
import { describeError } from '../../../lib/describe-error';
import { fieldErrors } from '../../../lib/field-errors';
import { conflictCurrentUser } from '../api/conflict-current-user';
import type { User } from '../api/user-schema';
import { useUpdateUser } from '../hooks/useUpdateUser';
import { changedUserFields } from '../utils/changed-user-fields';
import { editUserFormSchema, type EditUserFormValues } from '../utils/edit-user-form-schema';
import { ConflictNotice } from './ConflictNotice';
import { RoleCheckboxes } from './RoleCheckboxes';

export interface EditUserDialogProps {
  user: User;
  onClose(): void;
}

type Errors = Partial<Record<keyof EditUserFormValues, string>>;

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

export function EditUserDialog({ user, onClose }: EditUserDialogProps) {
  const styles = useStyles();
  const updateUser = useUpdateUser();
  // `original` is what the admin started editing from; `conflict` is the server's newer row.
  const [original, setOriginal] = useState<User>(user);
  const [conflict, setConflict] = useState<User | null>(null);
  const [values, setValues] = useState<EditUserFormValues>({ displayName: user.displayName, roles: user.roles });
  const [errors, setErrors] = useState<Errors>({});
  const [formError, setFormError] = useState<string | null>(null);

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFormError(null);
    const parsed = editUserFormSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrors<keyof EditUserFormValues>(parsed.error.issues));
      return;
    }
    setErrors({});
    const changes = changedUserFields(original, parsed.data);
    if (Object.keys(changes).length === 0) {
      onClose();
      return;
    }
    try {
      await updateUser.mutateAsync({ id: user.id, changes: { version: (conflict ?? original).version, ...changes } });
      onClose();
    } catch (error) {
      const current = conflictCurrentUser(error);
      if (current) {
        setConflict(current);
        return;
      }
      if (error instanceof ApiError && error.issues.length > 0) {
        setErrors(fieldErrors<keyof EditUserFormValues>(error.issues));
      }
      setFormError(describeError(error, 'The change could not be saved.'));
    }
  }

  function adoptCurrentValues(current: User) {
    setOriginal(current);
    setConflict(null);
    setValues({ displayName: current.displayName, roles: current.roles });
  }

  return (
    <Dialog open onOpenChange={(_, data) => !data.open && onClose()} modalType="modal">
      <DialogSurface>
        <form onSubmit={handleSubmit} noValidate>
          <DialogBody>
            <DialogTitle>Edit {user.displayName}</DialogTitle>
            <DialogContent className={styles.content}>
              <Text>{user.email}</Text>
              {conflict && <ConflictNotice current={conflict} />}
              {formError && (
                <MessageBar intent="error" role="alert">
                  <MessageBarBody>{formError}</MessageBarBody>
                </MessageBar>
              )}
              <Field label="Display name" required validationMessage={errors.displayName}>
                <Input
                  value={values.displayName}
                  onChange={(_, d) => setValues((v) => ({ ...v, displayName: d.value }))}
                />
              </Field>
              <RoleCheckboxes
                value={values.roles}
                onChange={(roles) => setValues((v) => ({ ...v, roles }))}
                error={errors.roles}
              />
            </DialogContent>
            <DialogActions>
              {conflict && (
                <Button appearance="secondary" onClick={() => adoptCurrentValues(conflict)}>
                  Use current values
                </Button>
              )}
              <Button appearance="secondary" onClick={onClose} disabled={updateUser.isPending}>
                Cancel
              </Button>
              <Button
                type="submit"
                appearance="primary"
                disabled={updateUser.isPending}
                icon={updateUser.isPending ? <Spinner size="tiny" /> : undefined}
              >
                {conflict ? 'Retry with my changes' : 'Save'}
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
