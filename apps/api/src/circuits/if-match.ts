import { ValidationError } from '../common/errors/app-error.js';
import { DraftVersionRequiredError } from './circuit-errors.js';

/** `3`, `"3"` and the weak form `W/"3"` all name draft version 3 (RFC 9110 §13.1.1 entity tags). */
const VERSION_TAG = /^(?:W\/)?"?(\d{1,9})"?$/;

export function draftVersionFromIfMatch(header: string | undefined): number {
  if (header === undefined || header.trim() === '') throw new DraftVersionRequiredError();
  const match = VERSION_TAG.exec(header.trim());
  if (!match) throw new ValidationError([{ path: 'If-Match', message: 'If-Match must be the draft version, e.g. "3".' }]);
  return Number(match[1]);
}
