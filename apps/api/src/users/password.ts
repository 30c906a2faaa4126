import { hash, verify } from '@node-rs/argon2';
import { z } from 'zod';

export const passwordSchema = z
  .string()
  .min(10, 'Use at least 10 characters.')
  .max(200, 'Use at most 200 characters.');

/**
 * argon2id with the library defaults (19 MiB memory, 2 passes, 1 lane): the minimum the OWASP
 * Password Storage Cheat Sheet recommends for argon2id.
 */
export function hashPassword(password: string): Promise<string> {
  return hash(password);
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}

let dummyHash: Promise<string> | undefined;

/** Verifies against a throwaway hash so an unknown e-mail costs as much time as a wrong password. */
export async function burnPasswordCheck(password: string): Promise<void> {
  dummyHash ??= hashPassword('linesmith-timing-equaliser');
  await verifyPassword(await dummyHash, password);
}
