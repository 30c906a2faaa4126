/**
 * A random key for the `Idempotency-Key` header: one per user action, so a retried or doubled
 * submit of that action is carried out once. `crypto.randomUUID` exists only in secure contexts
 * (a shop may open Linesmith over plain http on its network), `getRandomValues` everywhere.
 */
export function newIdempotencyKey(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return Array.from(bytes, (byte) => byte.toString(16).padStart(2, '0')).join('');
}
