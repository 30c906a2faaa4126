import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { PageLoading } from '../../shell/components/PageLoading';
import { useSession } from '../hooks/useSession';

/** Route element: signed-out users go to sign-in and come back to where they were heading. */
export function RequireSession() {
  const { state } = useSession();
  const location = useLocation();

  if (state.status === 'restoring') {
    return <PageLoading label="Opening your session…" />;
  }
  if (state.status === 'signed-out') {
    // After a deliberate sign-out the next person starts at the home page, not at the last one's.
    const next = state.reason === 'signed-out' ? '' : `?next=${encodeURIComponent(location.pathname + location.search)}`;
    return <Navigate to={`/sign-in${next}`} replace />;
  }
  return <Outlet />;
}
