import { MessageBar, MessageBarBody } from '@fluentui/react-components';
import { z } from 'zod';
import { useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { useApiClient } from '../../../lib/useApiClient';
import { accountLinkErrorMessage } from '../utils/account-link-error-message';
import { AccountCard } from './AccountCard';
import { NewPasswordForm } from './NewPasswordForm';

/** `/reset-password?token=…`: a new password from the e-mailed link, then back to sign in. */
export function ResetPasswordPage() {
  const client = useApiClient();
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';
  const [done, setDone] = useState(false);

  return (
    <AccountCard title="Choose a new password" intro="The link in the e-mail works once.">
      {done && (
        <MessageBar intent="success" role="status">
          <MessageBarBody>Your password is changed. Sign in with the new one.</MessageBarBody>
        </MessageBar>
      )}
      {!done && token && (
        <NewPasswordForm
          submitLabel="Change password"
          onSubmit={async (password) => {
            await client.request('/api/auth/reset-password', { method: 'POST', body: { token, password }, schema: z.unknown() });
            setDone(true);
          }}
          describeFailure={(error) => accountLinkErrorMessage(error, 'Ask for a new link on the "Forgot password?" page.')}
        />
      )}
      {!done && !token && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>This reset link is incomplete. Open the link from the e-mail again, or ask for a new one.</MessageBarBody>
        </MessageBar>
      )}
      <Link to={done ? '/sign-in' : '/forgot-password'}>{done ? 'Sign in' : 'Ask for a new link'}</Link>
    </AccountCard>
  );
}
