import { PayloadTooLargeException, type CallHandler, type ExecutionContext, type NestInterceptor, type Type } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import type { Observable } from 'rxjs';
import { PriceListTooLargeError } from './price-list-errors.js';
import { PRICE_LIST_MAX_BYTES } from './price-list-limits.js';

const MulterPriceListInterceptor: Type<NestInterceptor> = FileInterceptor('file', {
  limits: { fileSize: PRICE_LIST_MAX_BYTES, files: 1, fields: 10 },
  defParamCharset: 'utf8',
});

/** Multer in memory for the `file` field, at most 5 MB; a larger file answers 413 with a clear message. */
export class PriceListFileInterceptor extends MulterPriceListInterceptor {
  override async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    try {
      return await super.intercept(context, next);
    } catch (error) {
      if (error instanceof PayloadTooLargeException) throw new PriceListTooLargeError();
      throw error;
    }
  }
}
