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
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { ApiError } from '../../../lib/api-error';
import { describeError } from '../../../lib/describe-error';
import { fieldErrors } from '../../../lib/field-errors';
import { useCreateUser } from '../hooks/useCreateUser';
import {
  createUserFormSchema,
  minPasswordLength,
  type CreateUserFormValues,
} from '../utils/create-user-form-schema';
import { RoleCheckboxes } from './RoleCheckboxes';

export interface CreateUserDialogProps {
  open: boolean;
  onClose(): void;
}

type Errors = Partial<Record<keyof CreateUserFormValues, string>>;

const emptyForm: CreateUserFormValues = { email: '', displayName: '', roles: [], password: '' };

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

export function CreateUserDialog({ open, onClose }: CreateUserDialogProps) {
  const styles = useStyles();
  const createUser = useCreateUser();
  const [values, setValues] = useState<CreateUserFormValues>(emptyForm);
  const [errors, setErrors] = useState<Errors>({});
  const [formError, setFormError] = useState<string | null>(null);

  function close() {
    setValues(emptyForm);
    setErrors({});
    setFormError(null);
    createUser.reset();
    onClose();
  }

  function set<K extends keyof CreateUserFormValues>(key: K, value: CreateUserFormValues[K]) {
    setValues((current) => ({ ...current, [key]: value }));
  }

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFormError(null);
    const parsed = createUserFormSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrors<keyof CreateUserFormValues>(parsed.error.issues));
      return;
    }
    setErrors({});
    try {
      await createUser.mutateAsync(parsed.data);
      close();
    } catch (error) {
      if (error instanceof ApiError && error.code === 'conflict') {
        setErrors({ email: error.message || 'A user with this e-mail address already exists.' });
      } else {
        if (error instanceof ApiError) setErrors(fieldErrors<keyof CreateUserFormValues>(error.issues));
        setFormError(describeError(error, 'The user could not be created.'));
      }
    }
  }

  return (
    <Dialog open={open} onOpenChange={(_, data) => !data.open && close()} modalType="modal">
      <DialogSurface>
        <form onSubmit={handleSubmit} noValidate>
          <DialogBody>
            <DialogTitle>New user</DialogTitle>
            <DialogContent className={styles.content}>
              {formError && (
                <MessageBar intent="error" role="alert">
                  <MessageBarBody>{formError}</MessageBarBody>
                </MessageBar>
              )}
              <Field label="E-mail" required validationMessage={errors.email}>
                <Input type="email" value={values.email} onChange={(_, d) => set('email', d.value)} />
              </Field>
              <Field label="Display name" required validationMessage={errors.displayName}>
                <Input value={values.displayName} onChange={(_, d) => set('displayName', d.value)} />
              </Field>
              <RoleCheckboxes value={values.roles} onChange={(roles) => set('roles', roles)} error={errors.roles} />
              <Field
                label="Initial password"
                required
                validationMessage={errors.password}
                hint={`At least ${minPasswordLength} characters. Pass it on in person; the user should change it.`}
              >
                <Input
                  type="password"
                  autoComplete="new-password"
                  value={values.password}
                  onChange={(_, d) => set('password', d.value)}
                />
              </Field>
            </DialogContent>
            <DialogActions>
              <Button appearance="secondary" onClick={close} disabled={createUser.isPending}>
                Cancel
              </Button>
              <Button
                type="submit"
                appearance="primary"
                disabled={createUser.isPending}
                icon={createUser.isPending ? <Spinner size="tiny" /> : undefined}
              >
                Create user
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
