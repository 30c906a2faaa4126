import { CIRCUIT_STATUSES, type CircuitStatus } from '../circuits/circuit-status.js';
import { AppError } from '../common/errors/app-error.js';
import { nextStatus, type ReviewAction } from './review-transitions.js';

/** The review flow of PRODUCT.md, journey step 6, written out as a table: status before → after, or refused. */
const EXPECTED: Record<ReviewAction, Partial<Record<CircuitStatus, CircuitStatus>>> = {
  submit: { draft: 'in-review', returned: 'in-review' },
  acknowledge: { 'in-review': 'in-review' },
  approve: { 'in-review': 'approved' },
  return: { 'in-review': 'returned' },
};

describe('review state machine', () => {
  const cases = (Object.keys(EXPECTED) as ReviewAction[]).flatMap((action) =>
    CIRCUIT_STATUSES.map((status) => [action, status, EXPECTED[action][status]] as const),
  );

  it.each(cases)('%s from %s → %s', (action, status, expected) => {
    if (expected) {
      expect(nextStatus(action, status)).toBe(expected);
      return;
    }
    let caught: unknown;
    try {
      nextStatus(action, status);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(AppError);
    const body = (caught as AppError).toBody();
    expect(body).toMatchObject({ statusCode: 409, code: 'invalid_transition', currentStatus: status });
    expect(body.message).toContain(`This circuit is ${status}`);
  });

  it('never lets an approved, ordered or installed circuit back into review', () => {
    for (const status of ['approved', 'ordered', 'installed'] as const) {
      for (const action of Object.keys(EXPECTED) as ReviewAction[]) expect(() => nextStatus(action, status)).toThrow(AppError);
    }
  });
});
