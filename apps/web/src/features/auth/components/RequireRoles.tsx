import { Outlet } from 'react-router-dom';
import type { Role } from '../../../lib/contract/role-schema';
import { NoAccessPage } from '../../shell/components/NoAccessPage';
import { useSession } from '../hooks/useSession';

export interface RequireRolesProps {
  anyOf: readonly Role[];
}

/** Route element: shows a "no access" page instead of a section the user's roles do not open. */
export function RequireRoles({ anyOf }: RequireRolesProps) {
  const { hasRole } = useSession();
  return hasRole(...anyOf) ? <Outlet /> : <NoAccessPage />;
}
