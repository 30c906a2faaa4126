import { AppError } from '../common/errors/app-error.js';
import { ErrorCode } from '../common/errors/error-code.js';

export const PHOTO_MAX_BYTES = 15 * 1024 * 1024;

export class PhotoTooLargeError extends AppError {
  constructor() {
    super(ErrorCode.PayloadTooLarge, `The photo is larger than ${PHOTO_MAX_BYTES / (1024 * 1024)} MB. Send a smaller photo.`, [
      { path: 'file', message: `At most ${PHOTO_MAX_BYTES / (1024 * 1024)} MB.` },
    ]);
  }
}
