import {
  BookOpenRegular,
  BoxMultipleRegular,
  CartRegular,
  ClipboardTaskListLtrRegular,
  PeopleSettingsRegular,
  VehicleTruckProfileRegular,
  type FluentIcon,
} from '@fluentui/react-icons';
import type { SectionKey } from '../../auth/utils/section-roles';

export interface NavItem {
  section: SectionKey;
  to: string;
  label: string;
  icon: FluentIcon;
}

/** The left navigation, in display order. Who sees an item is decided by `sectionRoles`. */
export const navItems: readonly NavItem[] = [
  { section: 'builds', to: '/builds', label: 'Builds', icon: VehicleTruckProfileRegular },
  { section: 'reviews', to: '/reviews', label: 'Reviews', icon: ClipboardTaskListLtrRegular },
  { section: 'orders', to: '/orders', label: 'Orders', icon: CartRegular },
  { section: 'catalogue', to: '/catalogue', label: 'Catalogue', icon: BoxMultipleRegular },
  { section: 'reference', to: '/reference', label: 'Reference', icon: BookOpenRegular },
  { section: 'admin', to: '/admin', label: 'Admin', icon: PeopleSettingsRegular },
];
