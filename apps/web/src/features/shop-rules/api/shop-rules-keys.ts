/** Query keys of the shop rules (one record per shop). */
export const shopRulesKeys = {
  all: ['shop-rules'] as const,
  current: () => [...shopRulesKeys.all, 'current'] as const,
};
