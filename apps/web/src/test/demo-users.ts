import type { Me } from '../lib/contract/me-schema';

const shop = { id: 'shop-tidewater', name: 'Tidewater Rod & Diesel' };

/** The four demo users of the API contract, one per role. */
export const demoUsers = {
  admin: { id: 'u-owner', email: 'owner@tidewater.example', displayName: 'Dana Whitcombe', roles: ['admin'], shop },
  fabricator: { id: 'u-fab', email: 'fab@tidewater.example', displayName: 'Rafe Okonkwo', roles: ['fabricator'], shop },
  'parts-clerk': {
    id: 'u-parts',
    email: 'parts@tidewater.example',
    displayName: 'Maribel Soto',
    roles: ['parts-clerk'],
    shop,
  },
  reviewer: { id: 'u-lead', email: 'lead@tidewater.example', displayName: 'Hollis Brandt', roles: ['reviewer'], shop },
} satisfies Record<string, Me>;

export function sessionBody(user: Me, accessToken = `token-${user.id}-1`) {
  return { accessToken, expiresInSec: 900, user };
}
