import { randomUUID } from 'node:crypto';

const KEY_PATTERN = /^[0-9a-f-]{36}(\/[0-9a-f-]{36})*$/;

/** `<owner uuid>/<random uuid>`: unguessable, and free of anything a user typed. */
export function newStorageKey(ownerId: string): string {
  return assertStorageKey(`${ownerId}/${randomUUID()}`);
}

/** Drivers refuse any key not made by `newStorageKey`, so no path can climb out of the store. */
export function assertStorageKey(key: string): string {
  if (!KEY_PATTERN.test(key)) throw new Error(`Refusing storage key "${key}".`);
  return key;
}
