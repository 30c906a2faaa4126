import type { ZipLimits } from './zip-inspection.js';

export const PRICE_LIST_MAX_BYTES = 5 * 1024 * 1024;
export const PRICE_LIST_MAX_ROWS = 20_000;

/** A 5 MB workbook of plain values inflates roughly 5–10×; these bounds leave room and stop bombs. */
export const PRICE_LIST_ZIP_LIMITS: ZipLimits = { maxInflatedBytes: 100 * 1024 * 1024, maxRatio: 200, maxEntries: 500 };
