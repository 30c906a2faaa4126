import { formatInches, inToMm, mmToIn, parseInches, type LengthUnit } from '@linesmith/routing';

/** Reads a typed length in the user's unit: fractional inches (`23 11/16`) or millimetres. */
export function parseLength(text: string, unit: LengthUnit): number {
  if (unit === 'mm') {
    const mm = Number(text.trim().replace(/\s*mm$/i, ''));
    if (!Number.isFinite(mm) || text.trim() === '') throw new RangeError(`"${text}" is not a length in millimetres`);
    return mmToIn(mm);
  }
  return parseInches(text);
}

/** A length for an input field, without the unit mark. */
export const lengthFieldText = (valueIn: number | null | undefined, unit: LengthUnit): string =>
  valueIn === null || valueIn === undefined ? '' : unit === 'mm' ? String(Math.round(inToMm(valueIn))) : formatInches(valueIn);
