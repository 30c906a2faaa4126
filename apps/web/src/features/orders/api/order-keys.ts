/** Query keys of the orders feature; every order mutation invalidates `all`. */
export const orderKeys = {
  all: ['orders'] as const,
  list: () => [...orderKeys.all, 'list'] as const,
  detail: (id: string) => [...orderKeys.all, 'detail', id] as const,
  approvedCircuits: () => [...orderKeys.all, 'approved-circuits'] as const,
};
