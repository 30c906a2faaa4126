import { MessageBar, MessageBarBody } from '@fluentui/react-components';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { useApiClient } from '../../../lib/useApiClient';
import { accountLinkErrorMessage } from '../utils/account-link-error-message';
import { AccountCard } from './AccountCard';
import { NewPasswordForm } from './NewPasswordForm';

/** `/accept-invite?token=…`: the invited user chooses a password and is signed in. */
export function AcceptInvitePage() {
  const client = useApiClient();
  const navigate = useNavigate();
  const [params] = useSearchParams();
  const token = params.get('token') ?? '';

  return (
    <AccountCard title="Welcome to Linesmith" intro="Choose a password to finish setting up your account.">
      {token ? (
        <NewPasswordForm
          submitLabel="Set password and sign in"
          onSubmit={async (password) => {
            await client.signInWith('/api/auth/accept-invite', { token, password });
            navigate('/', { replace: true });
          }}
          describeFailure={(error) => accountLinkErrorMessage(error, 'Ask your shop admin for a new invitation.')}
        />
      ) : (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>
            This invitation link is incomplete. Open the link from the e-mail again, or ask your shop admin for a new one.
          </MessageBarBody>
        </MessageBar>
      )}
      <Link to="/sign-in">Back to sign in</Link>
    </AccountCard>
  );
}
