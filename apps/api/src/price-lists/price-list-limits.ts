import type { ZipLimits } from './zip-inspection.js';

export const PRICE_LIST_MAX_BYTES = 5 * 1024 * 1024;
export const PRICE_LIST_MAX_ROWS = 20_000;
/** Columns that may hold values; a price list uses a handful. */
export const PRICE_LIST_MAX_COLUMNS = 100;

/** A first screen on what the archive declares (it may lie); these bounds leave room and stop crude bombs. */
export const PRICE_LIST_ZIP_LIMITS: ZipLimits = { maxInflatedBytes: 100 * 1024 * 1024, maxRatio: 200, maxEntries: 500 };

/**
 * What may really be inflated from one workbook, counted while inflating: 20,000 rows of five
 * columns written by exceljs unpack to about 4.9 MB (sheet plus shared strings, measured), ten
 * columns to about 10 MB. It bounds memory; the idle limit below stops a part with nothing in it sooner.
 */
export const PRICE_LIST_INFLATE_BUDGET_BYTES = 16 * 1024 * 1024;

/**
 * What may be inflated without the reader finding a value (a row holding one, a shared string):
 * the parts of a sheet before and between its rows are a few kB; 16,384 separate column widths would be ~800 kB.
 */
export const PRICE_LIST_IDLE_INFLATE_BYTES = 1024 * 1024;

/** Shared strings kept for the sheet: more than 20,000 rows of ten text columns could use. */
export const PRICE_LIST_MAX_SHARED_STRINGS = 200_000;

/** The longest text value or tag of a workbook (Excel's own cell limit is 32,767 characters). */
export const PRICE_LIST_MAX_TOKEN_BYTES = 1024 * 1024;
