import { z } from 'zod';

/** PostgreSQL `integer` (int4) range: version, revision and position columns. */
export const PG_INT_MAX = 2_147_483_647;

/** Row versions (`@VersionColumn`, int4): anything outside cannot match a row and would overflow the column. */
export const versionSchema = z.number().int('Give the version as a whole number.').min(0).max(PG_INT_MAX);

/** A circuit revision number from a path or query (int4 in the database). */
export const revisionNumberSchema = z.coerce
  .number()
  .int('A revision number is a whole number.')
  .min(1, 'Revision numbers start at 1.')
  .max(PG_INT_MAX, 'No circuit has that many revisions.');

/** List paging: beyond this page nothing is left to show. */
export const pageSchema = z.coerce.number().int().min(1).max(1_000_000).default(1);

/**
 * Stock and order quantities are numeric(12,3): three decimals, below 10^9. A change is rounded to
 * the stored precision first, so 1e-9 is refused instead of stored as 0.
 */
export const QUANTITY_DECIMALS = 3;
export const MAX_STOCK = 999_999_999.999;
export const MAX_QUANTITY_CHANGE = 100_000_000;

export function roundQuantity(value: number): number {
  const scale = 10 ** QUANTITY_DECIMALS;
  return Math.round(value * scale) / scale;
}

/** A positive quantity (received, ordered) at the stored precision. */
export const positiveQuantitySchema = z
  .number()
  .finite()
  .transform(roundQuantity)
  .refine((value) => value > 0, 'Enter a quantity of at least 0.001.')
  .refine((value) => value < MAX_QUANTITY_CHANGE, 'This quantity is too large.');
