import { AppError } from '../common/errors/app-error.js';
import { ErrorCode } from '../common/errors/error-code.js';

/** A draft write without `If-Match`: the server cannot tell which version the client edited. */
export class DraftVersionRequiredError extends AppError {
  constructor() {
    super(
      ErrorCode.PreconditionRequired,
      'Send the draft version you edited in the If-Match header, so no one else’s changes are overwritten.',
    );
  }
}
