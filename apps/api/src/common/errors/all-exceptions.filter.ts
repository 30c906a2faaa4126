import { Catch, HttpException, Logger, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { Response } from 'express';
import { AppError, RateLimitedError, type ErrorBody } from './app-error.js';
import { isDatabaseUnavailable } from './database-errors.js';
import { ErrorCode, HTTP_STATUS_OF } from './error-code.js';

const CODE_OF_STATUS: Record<number, ErrorCode> = {
  400: ErrorCode.BadRequest,
  401: ErrorCode.Unauthorized,
  403: ErrorCode.Forbidden,
  404: ErrorCode.NotFound,
  409: ErrorCode.Conflict,
  429: ErrorCode.RateLimited,
  503: ErrorCode.Unavailable,
};

const MESSAGE_OF_CODE: Partial<Record<ErrorCode, string>> = {
  rate_limited: 'Too many attempts. Please wait a minute and try again.',
  unavailable: 'The service is temporarily unavailable. Please try again shortly.',
  internal_error: 'Something went wrong on our side. Please try again.',
};

function codeOfStatus(status: number): ErrorCode {
  return CODE_OF_STATUS[status] ?? (status >= 500 ? ErrorCode.Internal : ErrorCode.BadRequest);
}

function messageOfHttpException(exception: HttpException): string {
  const response = exception.getResponse();
  if (typeof response === 'string') return response;
  const message = (response as { message?: unknown }).message;
  if (Array.isArray(message)) return message.join('; ');
  return typeof message === 'string' ? message : exception.message;
}

/** Errors thrown by Express middleware (e.g. a malformed JSON body) carry an HTTP status. */
function exposedClientStatus(exception: unknown): number | undefined {
  if (!(exception instanceof Error)) return undefined;
  const { status, expose } = exception as { status?: unknown; expose?: unknown };
  return typeof status === 'number' && status >= 400 && status < 500 && expose === true ? status : undefined;
}

/** The one place where any error becomes the contract's error body. */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const body = this.toBody(exception);
    const response = host.switchToHttp().getResponse<Response>();
    if (response.headersSent) return;
    if (exception instanceof RateLimitedError) response.setHeader('Retry-After', String(exception.retryAfterSec));
    response.status(body.statusCode).json(body);
  }

  toBody(exception: unknown): ErrorBody {
    if (exception instanceof AppError) return exception.toBody();
    if (exception instanceof HttpException) {
      const statusCode = exception.getStatus();
      const code = codeOfStatus(statusCode);
      if (statusCode >= 500) this.logger.error(exception);
      return { statusCode, code, message: MESSAGE_OF_CODE[code] ?? messageOfHttpException(exception), issues: [] };
    }
    const clientStatus = exposedClientStatus(exception);
    if (clientStatus !== undefined) {
      return { statusCode: clientStatus, code: codeOfStatus(clientStatus), message: (exception as Error).message, issues: [] };
    }
    if (isDatabaseUnavailable(exception)) {
      this.logger.error(exception instanceof Error ? exception.message : exception, 'database unavailable');
      return this.generic(ErrorCode.Unavailable);
    }
    this.logger.error(exception instanceof Error ? (exception.stack ?? exception.message) : exception);
    return this.generic(ErrorCode.Internal);
  }

  private generic(code: ErrorCode): ErrorBody {
    return { statusCode: HTTP_STATUS_OF[code], code, message: MESSAGE_OF_CODE[code] ?? 'Error.', issues: [] };
  }
}
