import { Button, Field, Input, MessageBar, MessageBarBody, Spinner, makeStyles, tokens } from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { ApiError } from '../../../lib/api-error';
import { fieldErrors } from '../../../lib/field-errors';
import { minPasswordLength, newPasswordFormSchema, type NewPasswordFormValues } from '../utils/new-password-form-schema';

export interface NewPasswordFormProps {
  submitLabel: string;
  /** Resolves when done; a thrown error's message is shown above the form. */
  onSubmit(password: string): Promise<void>;
  describeFailure(error: unknown): string;
}

const useStyles = makeStyles({ form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM } });

export function NewPasswordForm({ submitLabel, onSubmit, describeFailure }: NewPasswordFormProps) {
  const styles = useStyles();
  const [values, setValues] = useState<NewPasswordFormValues>({ password: '', confirm: '' });
  const [errors, setErrors] = useState<Partial<Record<keyof NewPasswordFormValues, string>>>({});
  const [failure, setFailure] = useState<string | null>(null);
  const [submitting, setSubmitting] = useState(false);

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (submitting) return;
    setFailure(null);
    const parsed = newPasswordFormSchema.safeParse(values);
    if (!parsed.success) {
      setErrors(fieldErrors<keyof NewPasswordFormValues>(parsed.error.issues));
      return;
    }
    setErrors({});
    setSubmitting(true);
    try {
      await onSubmit(parsed.data.password);
    } catch (error) {
      // The server also refuses common and easily guessed passwords: say so at the field.
      const passwordIssue = error instanceof ApiError ? fieldErrors<keyof NewPasswordFormValues>(error.issues).password : undefined;
      if (passwordIssue) setErrors({ password: passwordIssue });
      else setFailure(describeFailure(error));
    } finally {
      setSubmitting(false);
    }
  }

  return (
    <form className={styles.form} onSubmit={handleSubmit} noValidate aria-label="Choose a password">
      {failure && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>{failure}</MessageBarBody>
        </MessageBar>
      )}
      <Field label="New password" required validationMessage={errors.password} hint={`At least ${minPasswordLength} characters.`}>
        <Input
          type="password"
          autoComplete="new-password"
          value={values.password}
          onChange={(_, d) => setValues((v) => ({ ...v, password: d.value }))}
        />
      </Field>
      <Field label="Repeat the password" required validationMessage={errors.confirm}>
        <Input
          type="password"
          autoComplete="new-password"
          value={values.confirm}
          onChange={(_, d) => setValues((v) => ({ ...v, confirm: d.value }))}
        />
      </Field>
      <Button type="submit" appearance="primary" disabled={submitting} icon={submitting ? <Spinner size="tiny" /> : undefined}>
        {submitLabel}
      </Button>
    </form>
  );
}
