import { AppError, type ErrorIssue } from '../common/errors/app-error.js';
import { ErrorCode } from '../common/errors/error-code.js';
import { PRICE_LIST_MAX_BYTES } from './price-list-limits.js';

/** One problem of the price list: the 1-based row of the file and the mapped column's header. */
export interface ImportIssue {
  row: number;
  column: string;
  message: string;
}

/** The file itself cannot be used (not a workbook, damaged, formulas, too many rows). */
export class PriceListFileError extends AppError {
  constructor(message: string, issues: ErrorIssue[] = [{ path: 'file', message }]) {
    super(ErrorCode.ValidationFailed, message, issues);
  }
}

/** Some rows are wrong: 400 with the row-by-row report; nothing was written. */
export class PriceListRowsError extends AppError {
  constructor(report: ImportIssue[], counts: object) {
    super(ErrorCode.ValidationFailed, `${report.length} row problem(s): nothing was imported. Fix the file and try again.`, [], {
      report,
      counts,
    });
  }
}

export class PriceListTooLargeError extends AppError {
  constructor() {
    super(ErrorCode.PayloadTooLarge, `The price list is larger than ${PRICE_LIST_MAX_BYTES / (1024 * 1024)} MB. Split it into smaller files.`, [
      { path: 'file', message: 'The file is too large.' },
    ]);
  }
}
