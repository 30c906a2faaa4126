import { hash, verify } from '@node-rs/argon2';
import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import { adjacencyGraphs, dictionary } from '@zxcvbn-ts/language-common';
import { z } from 'zod';

/**
 * zxcvbn score 3 ("safely unguessable", about 10^8 guesses or more, zxcvbn's own scale) is the
 * lowest we accept; the common-password and keyboard-pattern lists ship with @zxcvbn-ts/language-common.
 */
const MIN_STRENGTH_SCORE = 3;

let estimator: ZxcvbnFactory | undefined;
/** Built on first use: loading the dictionaries costs a few tens of milliseconds. */
function strengthEstimator(): ZxcvbnFactory {
  estimator ??= new ZxcvbnFactory({ dictionary, graphs: adjacencyGraphs });
  return estimator;
}

/** Why a password of acceptable length is still refused, or null when it is strong enough. */
export function weakPasswordReason(password: string): string | null {
  if (password.trim().length === 0) return 'A password of only spaces is not allowed.';
  const result = strengthEstimator().check(password);
  if (result.score >= MIN_STRENGTH_SCORE) return null;
  const warning = result.feedback.warning ? ` ${result.feedback.warning}` : '';
  return `This password is too common or too easy to guess.${warning} Try a few unrelated words.`;
}

export const passwordSchema = z
  .string()
  .min(10, 'Use at least 10 characters.')
  .max(200, 'Use at most 200 characters.')
  .superRefine((password, ctx) => {
    const reason = password.length >= 10 && password.length <= 200 ? weakPasswordReason(password) : null;
    if (reason) ctx.addIssue({ code: 'custom', message: reason });
  });

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
