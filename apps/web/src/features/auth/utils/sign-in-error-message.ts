import { ApiError } from '../../../lib/api-error';

/** The API's own words where it has them; a plain sentence otherwise. */
export function signInErrorMessage(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.code === 'rate_limited') {
      return error.message || 'Too many sign-in attempts. Wait a minute, then try again.';
    }
    if (error.message) return error.message;
  }
  return 'Signing in failed. Try again in a moment.';
}
