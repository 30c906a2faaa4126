import { inToMm, type LengthUnit } from '@linesmith/routing';
import { formatInchValue } from './format-inch-value';

/**
 * A diameter of the thread tables, without the unit (the column header names it). Millimetres
 * keep two decimals: thread and tube sizes differ by fractions of a millimetre, which the
 * whole-millimetre `formatLength` would hide.
 */
export function formatTableLength(valueIn: number, unit: LengthUnit): string {
  return unit === 'mm' ? inToMm(valueIn).toFixed(2) : formatInchValue(valueIn);
}
