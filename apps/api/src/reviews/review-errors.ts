import { AppError } from '../common/errors/app-error.js';
import { ErrorCode } from '../common/errors/error-code.js';
import type { CircuitStatus } from '../circuits/circuit-status.js';
import type { OpenItems } from './open-items.js';

/** A review step the circuit's current status does not allow (409 `invalid_transition`). */
export class InvalidTransitionError extends AppError {
  constructor(message: string, current: CircuitStatus) {
    super(ErrorCode.InvalidTransition, message, [], { currentStatus: current });
  }
}

/** Approval refused while blockers remain or cautions are unacknowledged (409 `review_blocked`). */
export class ReviewBlockedError extends AppError {
  constructor(openItems: OpenItems) {
    const parts = [
      openItems.blockers.length ? `${openItems.blockers.length} blocker(s) must be fixed by the fabricator` : '',
      openItems.unacknowledgedCautions.length
        ? `${openItems.unacknowledgedCautions.length} caution(s) still need an acknowledgement`
        : '',
    ].filter(Boolean);
    super(ErrorCode.ReviewBlocked, `This revision cannot be approved yet: ${parts.join(' and ')}.`, [], { openItems });
  }
}
