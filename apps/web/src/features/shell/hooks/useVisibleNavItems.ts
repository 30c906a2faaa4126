import { useSession } from '../../auth/hooks/useSession';
import { sectionRoles } from '../../auth/utils/section-roles';
import { navItems, type NavItem } from '../utils/nav-items';

export function useVisibleNavItems(): readonly NavItem[] {
  const { hasRole } = useSession();
  return navItems.filter((item) => hasRole(...sectionRoles[item.section]));
}
