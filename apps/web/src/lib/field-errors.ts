import type { ApiIssue } from './api-error';

type IssueLike = ApiIssue | { path: readonly PropertyKey[]; message: string };

/**
 * First message per top-level field, from zod issues or the API's `issues`
 * (whose `path` is a dotted string such as `roles.0`).
 */
export function fieldErrors<K extends string>(issues: readonly IssueLike[]): Partial<Record<K, string>> {
  const errors: Partial<Record<K, string>> = {};
  for (const issue of issues) {
    const head = typeof issue.path === 'string' ? issue.path.split('.')[0] : String(issue.path[0] ?? '');
    const key = head as K;
    if (head && errors[key] === undefined) errors[key] = issue.message;
  }
  return errors;
}
