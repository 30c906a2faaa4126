import {
  Button,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { signInErrorMessage } from '../utils/sign-in-error-message';
import { signInFormSchema, type SignInFormValues } from '../utils/sign-in-form-schema';

export interface SignInFormProps {
  onSignIn(values: SignInFormValues): Promise<unknown>;
  onSignedIn(): void;
}

type FieldErrors = Partial<Record<keyof SignInFormValues, string>>;

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

export function SignInForm({ onSignIn, onSignedIn }: SignInFormProps) {
  const styles = useStyles();
  const [values, setValues] = useState<SignInFormValues>({ email: '', password: '' });
  const [fieldErrors, setFieldErrors] = useState<FieldErrors>({});
  const [apiError, setApiError] = useState<string | null>(null);
  const [submitting, setSubmitting] = useState(false);

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (submitting) return;
    setApiError(null);
    const parsed = signInFormSchema.safeParse(values);
    if (!parsed.success) {
      const errors: FieldErrors = {};
      for (const issue of parsed.error.issues) {
        const key = issue.path[0] as keyof SignInFormValues;
        errors[key] ??= issue.message;
      }
      setFieldErrors(errors);
      return;
    }
    setFieldErrors({});
    setSubmitting(true);
    try {
      await onSignIn(parsed.data);
    } catch (error) {
      setApiError(signInErrorMessage(error));
      setSubmitting(false);
      return;
    }
    onSignedIn();
  }

  return (
    <form className={styles.form} onSubmit={handleSubmit} noValidate aria-label="Sign in">
      {apiError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>{apiError}</MessageBarBody>
        </MessageBar>
      )}
      <Field label="E-mail" required validationMessage={fieldErrors.email}>
        <Input
          type="email"
          name="email"
          autoComplete="username"
          value={values.email}
          onChange={(_, data) => setValues((v) => ({ ...v, email: data.value }))}
        />
      </Field>
      <Field label="Password" required validationMessage={fieldErrors.password}>
        <Input
          type="password"
          name="password"
          autoComplete="current-password"
          value={values.password}
          onChange={(_, data) => setValues((v) => ({ ...v, password: data.value }))}
        />
      </Field>
      <Button
        type="submit"
        appearance="primary"
        disabled={submitting}
        icon={submitting ? <Spinner size="tiny" /> : undefined}
      >
        {submitting ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
