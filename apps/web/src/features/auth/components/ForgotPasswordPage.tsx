import { Button, Field, Input, MessageBar, MessageBarBody, Spinner, makeStyles, tokens } from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { z } from 'zod';
import { ApiError } from '../../../lib/api-error';
import { describeError } from '../../../lib/describe-error';
import { useApiClient } from '../../../lib/useApiClient';
import { forgotPasswordFormSchema } from '../utils/new-password-form-schema';
import { AccountCard } from './AccountCard';

const useStyles = makeStyles({ form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM } });

/** `/forgot-password`: asks for a reset link. The answer never says whether the address is known. */
export function ForgotPasswordPage() {
  const styles = useStyles();
  const client = useApiClient();
  const [email, setEmail] = useState('');
  const [emailError, setEmailError] = useState<string | undefined>();
  const [failure, setFailure] = useState<string | null>(null);
  const [sent, setSent] = useState(false);
  const [submitting, setSubmitting] = useState(false);

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFailure(null);
    const parsed = forgotPasswordFormSchema.safeParse({ email });
    if (!parsed.success) {
      setEmailError(parsed.error.issues[0].message);
      return;
    }
    setEmailError(undefined);
    setSubmitting(true);
    try {
      await client.request('/api/auth/request-reset', { method: 'POST', body: parsed.data, schema: z.unknown() });
      setSent(true);
    } catch (error) {
      setFailure(
        error instanceof ApiError && error.status === 429
          ? 'Too many requests. Wait a minute and try again.'
          : describeError(error, 'The request could not be sent.'),
      );
    } finally {
      setSubmitting(false);
    }
  }

  return (
    <AccountCard title="Forgot your password?" intro="Linesmith e-mails you a link to choose a new one.">
      {sent ? (
        <MessageBar intent="success" role="status">
          <MessageBarBody>If the address is known, a link is on its way. It works once and expires; check the spam folder too.</MessageBarBody>
        </MessageBar>
      ) : (
        <form className={styles.form} onSubmit={handleSubmit} noValidate aria-label="Ask for a reset link">
          {failure && (
            <MessageBar intent="error" role="alert">
              <MessageBarBody>{failure}</MessageBarBody>
            </MessageBar>
          )}
          <Field label="E-mail" required validationMessage={emailError}>
            <Input type="email" autoComplete="username" value={email} onChange={(_, d) => setEmail(d.value)} />
          </Field>
          <Button type="submit" appearance="primary" disabled={submitting} icon={submitting ? <Spinner size="tiny" /> : undefined}>
            Send the link
          </Button>
        </form>
      )}
      <Link to="/sign-in">Back to sign in</Link>
    </AccountCard>
  );
}
