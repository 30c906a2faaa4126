import { PayloadTooLargeException, type CallHandler, type ExecutionContext, type NestInterceptor, type Type } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';
import { MULTIPART_TEXT_LIMITS } from '../common/validation/multipart-limits.js';
import { PHOTO_MAX_BYTES, PhotoTooLargeError } from './upload-errors.js';

/** Multer in memory for the `file` field, one file, at most 15 MB, short text fields; UTF-8 file names decoded as such. */
const MulterPhotoInterceptor: Type<NestInterceptor> = FileInterceptor('file', {
  limits: { ...MULTIPART_TEXT_LIMITS, fileSize: PHOTO_MAX_BYTES, files: 1 },
  defParamCharset: 'utf8',
});

/** Turns multer's terse "File too large" into the app's 413 with a message a user can act on. */
export class PhotoFileInterceptor extends MulterPhotoInterceptor {
  override async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    try {
      return await super.intercept(context, next);
    } catch (error) {
      if (error instanceof PayloadTooLargeException) throw new PhotoTooLargeError();
      throw error;
    }
  }
}
