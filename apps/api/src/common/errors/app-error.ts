import { ErrorCode, HTTP_STATUS_OF } from './error-code.js';

export interface ErrorIssue {
  /** Dotted path of the offending field, e.g. `roles.0`; empty for the whole body. */
  path: string;
  message: string;
}

/** The JSON body of every error answer. */
export interface ErrorBody {
  statusCode: number;
  code: ErrorCode;
  message: string;
  issues: ErrorIssue[];
  [extra: string]: unknown;
}

/**
 * A typed, user-facing error. Services throw these; the global filter turns them into HTTP answers,
 * so services never deal with status codes. `extra` adds fields to the body (e.g. `current`).
 */
export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly issues: ErrorIssue[] = [],
    readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = new.target.name;
  }

  get statusCode(): number {
    return HTTP_STATUS_OF[this.code];
  }

  toBody(): ErrorBody {
    return { ...this.extra, statusCode: this.statusCode, code: this.code, message: this.message, issues: this.issues };
  }
}

export class ValidationError extends AppError {
  constructor(issues: ErrorIssue[], message = 'Some fields are not valid.') {
    super(ErrorCode.ValidationFailed, message, issues);
  }
}

export class NotFoundError extends AppError {
  constructor(what = 'The record') {
    super(ErrorCode.NotFound, `${what} was not found.`);
  }
}

export class ConflictError extends AppError {
  constructor(message: string, extra: Record<string, unknown> = {}) {
    super(ErrorCode.Conflict, message, [], extra);
  }
}

export class ForbiddenError extends AppError {
  constructor(message = 'You do not have permission to do that.') {
    super(ErrorCode.Forbidden, message);
  }
}

export class UnauthorizedError extends AppError {
  constructor(message = 'Please sign in again.') {
    super(ErrorCode.Unauthorized, message);
  }
}

export class RateLimitedError extends AppError {
  constructor(
    message: string,
    /** Seconds until another attempt is allowed (sent as Retry-After). */
    readonly retryAfterSec: number,
  ) {
    super(ErrorCode.RateLimited, message);
  }
}
