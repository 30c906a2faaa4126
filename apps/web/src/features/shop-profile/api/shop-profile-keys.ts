/** Query keys of the caller's own shop profile (one per session). */
export const shopProfileKeys = {
  all: ['shop-profile'] as const,
  current: () => [...shopProfileKeys.all, 'current'] as const,
};
