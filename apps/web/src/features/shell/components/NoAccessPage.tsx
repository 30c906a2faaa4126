import { Button } from '@fluentui/react-components';
import { LockClosedRegular } from '@fluentui/react-icons';
import { useNavigate } from 'react-router-dom';
import { StatusPage } from './StatusPage';

export function NoAccessPage() {
  const navigate = useNavigate();
  return (
    <StatusPage
      icon={<LockClosedRegular />}
      title="You don't have access to this section"
      actions={
        <Button appearance="primary" onClick={() => navigate('/')}>
          Go to the start page
        </Button>
      }
    >
      Your roles in this shop do not open this page. If your work needs it, ask your shop's admin to add the
      role to your account.
    </StatusPage>
  );
}
