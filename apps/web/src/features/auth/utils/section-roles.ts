import type { Role } from '../../../lib/contract/role-schema';

/**
 * Which roles may open each section (API contract, "Navigation by role"). The navigation and
 * the route guards both read this one table. Fabricators read the catalogue but do not edit it.
 */
export const sectionRoles = {
  builds: ['admin', 'fabricator', 'reviewer', 'parts-clerk'],
  reviews: ['reviewer', 'admin'],
  orders: ['parts-clerk', 'admin'],
  catalogue: ['parts-clerk', 'admin', 'fabricator'],
  reference: ['admin', 'fabricator', 'parts-clerk', 'reviewer'],
  admin: ['admin'],
} as const satisfies Record<string, readonly Role[]>;

export type SectionKey = keyof typeof sectionRoles;
