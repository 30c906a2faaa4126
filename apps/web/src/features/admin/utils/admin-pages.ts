/** The pages of the Admin section, in display order (all of them admin-only, like the section). */
export const adminPages = [
  { to: '/admin/users', label: 'Users' },
  { to: '/admin/shop-profile', label: 'Shop profile' },
  { to: '/admin/shop-rules', label: 'Shop rules' },
  { to: '/admin/outbox', label: 'Outbox' },
] as const;
