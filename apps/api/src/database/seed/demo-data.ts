import type { Role } from '../../users/role.js';

/** The invented demo shop of PRODUCT.md ("Demo scenario"); e-mails use the reserved .example domain. */
export const DEMO_SHOP = {
  name: 'Tidewater Rod & Diesel',
  slug: 'tidewater-rod-diesel',
  timezone: 'America/New_York',
  taxRatePercent: 0,
} as const;

export const DEMO_PASSWORD = 'linesmith-demo';

export const DEMO_USERS: ReadonlyArray<{ email: string; displayName: string; roles: Role[] }> = [
  { email: 'owner@tidewater.example', displayName: 'Dana Whitcombe', roles: ['admin'] },
  { email: 'fab@tidewater.example', displayName: 'Rafe Okonkwo', roles: ['fabricator'] },
  { email: 'parts@tidewater.example', displayName: 'Maribel Soto', roles: ['parts-clerk'] },
  { email: 'lead@tidewater.example', displayName: 'Hollis Brandt', roles: ['reviewer'] },
];
