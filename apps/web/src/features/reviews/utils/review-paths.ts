/** Addresses of the review feature's pages, in one place. */
export const reviewPath = (circuitId: string) => `/reviews/${encodeURIComponent(circuitId)}`;

export const comparePath = (circuitId: string, from: number | 'draft', to: number | 'draft') =>
  `/circuits/${encodeURIComponent(circuitId)}/compare?from=${from}&to=${to}`;

export const sheetPath = (circuitId: string, revision: number) =>
  `/circuits/${encodeURIComponent(circuitId)}/revisions/${revision}/sheet`;
