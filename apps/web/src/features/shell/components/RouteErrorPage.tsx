import { Button } from '@fluentui/react-components';
import { ShieldErrorRegular } from '@fluentui/react-icons';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { ApiError } from '../../../lib/api-error';
import { StatusPage } from './StatusPage';

function describe(error: unknown): string {
  if (isRouteErrorResponse(error)) return `${error.status} ${error.statusText}`.trim();
  if (error instanceof ApiError) return error.message;
  // A failed lazy import usually means a new version was deployed while this tab was open.
  if (error instanceof TypeError && /dynamically imported module|Importing a module script/i.test(error.message)) {
    return 'Part of Linesmith could not be loaded, probably because a newer version was installed. Reloading fixes this.';
  }
  if (error instanceof Error) return error.message;
  return 'An unexpected error occurred.';
}

/** Route error boundary: says what went wrong and offers a reload that keeps the session. */
export function RouteErrorPage() {
  const error = useRouteError();
  return (
    <StatusPage
      icon={<ShieldErrorRegular />}
      title="Something went wrong on this page"
      actions={
        <>
          <Button appearance="primary" onClick={() => window.location.reload()}>
            Try again
          </Button>
          <Button onClick={() => window.location.assign('/')}>Go to the start page</Button>
        </>
      }
    >
      {describe(error)} Your saved work is not affected. If this keeps happening, note what you were doing and tell
      your shop's admin.
    </StatusPage>
  );
}
