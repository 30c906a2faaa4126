import { ApiError } from './api-error';

/**
 * One sentence for an error banner. A validation answer's own message is generic ("Some fields
 * are not valid."), so the issues' messages are added: they carry the reason.
 */
export function describeError(error: unknown, fallback: string): string {
  if (error instanceof ApiError) {
    const details = error.issues.map((issue) => issue.message).filter((m) => m && m !== error.message);
    return [error.message, ...details].filter(Boolean).join(' ') || fallback;
  }
  return error instanceof Error && error.message ? error.message : fallback;
}
