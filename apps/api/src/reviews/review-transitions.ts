import type { CircuitStatus } from '../circuits/circuit-status.js';
import { InvalidTransitionError } from './review-errors.js';

/** The review steps a user can take on a circuit. */
export type ReviewAction = 'submit' | 'acknowledge' | 'approve' | 'return';

interface Transition {
  from: readonly CircuitStatus[];
  /** The circuit's status afterwards; acknowledging leaves it under review. */
  to: CircuitStatus;
  verb: string;
}

/** The review state machine: the one place that says which step is allowed from which status. */
export const REVIEW_TRANSITIONS: Readonly<Record<ReviewAction, Transition>> = {
  submit: { from: ['draft', 'returned'], to: 'in-review', verb: 'submitted for review' },
  acknowledge: { from: ['in-review'], to: 'in-review', verb: 'have cautions acknowledged' },
  approve: { from: ['in-review'], to: 'approved', verb: 'approved' },
  return: { from: ['in-review'], to: 'returned', verb: 'returned' },
};

/** The status after `action`, or a 409 `invalid_transition` naming the current status. */
export function nextStatus(action: ReviewAction, current: CircuitStatus): CircuitStatus {
  const transition = REVIEW_TRANSITIONS[action];
  if (!transition.from.includes(current)) {
    throw new InvalidTransitionError(
      `This circuit is ${current}; only a circuit that is ${transition.from.join(' or ')} can be ${transition.verb}.`,
      current,
    );
  }
  return transition.to;
}
