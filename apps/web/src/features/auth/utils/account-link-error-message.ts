import { ApiError } from '../../../lib/api-error';
import { describeError } from '../../../lib/describe-error';

/** Expired, used or mistyped links all answer 400/404/410: one sentence that says what to do next. */
export function accountLinkErrorMessage(error: unknown, whatToAskFor: string): string {
  if (error instanceof ApiError && [400, 404, 410].includes(error.status) && error.issues.every((i) => i.path !== 'password')) {
    return `This link is no longer valid (links work once and expire). ${whatToAskFor}`;
  }
  if (error instanceof ApiError && error.status === 429) return 'Too many attempts. Wait a minute and try again.';
  return describeError(error, 'Something went wrong. Try again.');
}
