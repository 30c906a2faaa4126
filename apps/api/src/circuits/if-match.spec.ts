import { AppError } from '../common/errors/app-error.js';
import { draftVersionFromIfMatch } from './if-match.js';

describe('draftVersionFromIfMatch', () => {
  it('reads bare, quoted and weak entity tags (RFC 9110 §8.8.3)', () => {
    expect(draftVersionFromIfMatch('7')).toBe(7);
    expect(draftVersionFromIfMatch('"7"')).toBe(7);
    expect(draftVersionFromIfMatch(' W/"12" ')).toBe(12);
  });

  it('answers 428 when missing and 400 when unreadable', () => {
    for (const missing of [undefined, '', '  ']) {
      expect(() => draftVersionFromIfMatch(missing)).toThrow(expect.objectContaining({ statusCode: 428, code: 'precondition_required' }));
    }
    for (const bad of ['*', 'abc', '"1", "2"', '-1']) {
      let caught: unknown;
      try {
        draftVersionFromIfMatch(bad);
      } catch (error) {
        caught = error;
      }
      expect(caught).toBeInstanceOf(AppError);
      expect((caught as AppError).statusCode).toBe(400);
    }
  });
});
