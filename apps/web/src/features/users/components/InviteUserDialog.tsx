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
import { useInviteUser } from '../hooks/useInviteUser';
import { inviteUserFormSchema, type InviteUserFormValues } from '../utils/invite-user-form-schema';
import { RoleCheckboxes } from './RoleCheckboxes';

export interface InviteUserDialogProps {
  onClose(): void;
}

type Errors = Partial<Record<keyof InviteUserFormValues, string>>;

const useStyles = makeStyles({
  content: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

/** Invites someone by e-mail: they choose their own password from the link (valid for 7 days). */
export function InviteUserDialog({ onClose }: InviteUserDialogProps) {
  const styles = useStyles();
  const invite = useInviteUser();
  const [values, setValues] = useState<InviteUserFormValues>({ email: '', displayName: '', roles: [] });
  const [errors, setErrors] = useState<Errors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFormError(null);
    const parsed = inviteUserFormSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrors<keyof InviteUserFormValues>(parsed.error.issues));
      return;
    }
    setErrors({});
    try {
      await invite.mutateAsync(parsed.data);
      setSentTo(parsed.data.email);
    } catch (error) {
      if (error instanceof ApiError && error.code === 'conflict') {
        setErrors({ email: error.message || 'A user with this e-mail address already exists.' });
        return;
      }
      if (error instanceof ApiError) setErrors(fieldErrors<keyof InviteUserFormValues>(error.issues));
      setFormError(describeError(error, 'The invitation could not be sent.'));
    }
  }

  return (
    <Dialog open onOpenChange={(_, d) => !d.open && onClose()} modalType="modal">
      <DialogSurface>
        <form onSubmit={handleSubmit} noValidate aria-label="Invite user">
          <DialogBody>
            <DialogTitle>Invite user</DialogTitle>
            <DialogContent className={styles.content}>
              {sentTo ? (
                <MessageBar intent="success" role="status">
                  <MessageBarBody>
                    An invitation is on its way to {sentTo}. The link is valid for 7 days; Admin › Outbox shows whether it left.
                  </MessageBarBody>
                </MessageBar>
              ) : (
                <>
                  <Text>The new user receives an e-mail with a link to choose a password and sign in.</Text>
                  {formError && (
                    <MessageBar intent="error" role="alert">
                      <MessageBarBody>{formError}</MessageBarBody>
                    </MessageBar>
                  )}
                  <Field label="E-mail" required validationMessage={errors.email}>
                    <Input type="email" value={values.email} onChange={(_, d) => setValues((v) => ({ ...v, email: d.value }))} />
                  </Field>
                  <Field label="Display name" required validationMessage={errors.displayName}>
                    <Input value={values.displayName} onChange={(_, d) => setValues((v) => ({ ...v, displayName: d.value }))} />
                  </Field>
                  <RoleCheckboxes value={values.roles} onChange={(roles) => setValues((v) => ({ ...v, roles }))} error={errors.roles} />
                </>
              )}
            </DialogContent>
            <DialogActions>
              <Button appearance="secondary" onClick={onClose} disabled={invite.isPending}>
                {sentTo ? 'Close' : 'Cancel'}
              </Button>
              {!sentTo && (
                <Button type="submit" appearance="primary" disabled={invite.isPending} icon={invite.isPending ? <Spinner size="tiny" /> : undefined}>
                  Send invitation
                </Button>
              )}
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
