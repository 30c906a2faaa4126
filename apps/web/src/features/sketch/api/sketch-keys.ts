/** Query keys of what the sketch editor loads besides the circuit (the catalogue and the shop rules). */
export const sketchKeys = {
  all: ['sketch'] as const,
  catalogue: () => [...sketchKeys.all, 'catalogue'] as const,
  shopRules: () => [...sketchKeys.all, 'shop-rules'] as const,
};
