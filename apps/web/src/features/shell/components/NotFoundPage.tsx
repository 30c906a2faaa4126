import { Button } from '@fluentui/react-components';
import { DocumentSearchRegular } from '@fluentui/react-icons';
import { useLocation, useNavigate } from 'react-router-dom';
import { StatusPage } from './StatusPage';

export function NotFoundPage() {
  const location = useLocation();
  const navigate = useNavigate();
  return (
    <StatusPage
      icon={<DocumentSearchRegular />}
      title="Page not found"
      actions={
        <Button appearance="primary" onClick={() => navigate('/')}>
          Go to the start page
        </Button>
      }
    >
      Linesmith has no page at <code>{location.pathname}</code>. The link may be mistyped, or the record may have
      been removed.
    </StatusPage>
  );
}
