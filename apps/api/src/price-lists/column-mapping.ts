import { ValidationError } from '../common/errors/app-error.js';
import { MAPPING_FIELDS, type ColumnMapping, type MappingField } from './dto/price-list.schemas.js';

/** Header words suppliers commonly use for each field, tried in this order. */
const HEADER_PATTERNS: Record<MappingField, RegExp> = {
  partNumber: /part\s*(no|num|number|#)|p\/?n\b|sku|item\s*(no|number|#)?$|catalog|code/i,
  description: /desc|name|title/i,
  price: /price|cost|net|each|amount/i,
  saleUnit: /unit|uom|sold\s*by/i,
  packSize: /pack|per\s*pkg|qty\s*per|case\s*qty/i,
};

/** A first guess from the header row; every header is used at most once. */
export function guessMapping(headers: readonly string[]): Partial<Record<MappingField, string>> {
  const taken = new Set<string>();
  const mapping: Partial<Record<MappingField, string>> = {};
  for (const field of MAPPING_FIELDS) {
    const found = headers.find((header) => !taken.has(header) && HEADER_PATTERNS[field].test(header));
    if (found) {
      mapping[field] = found;
      taken.add(found);
    }
  }
  return mapping;
}

/** Column index (0-based) of each mapped field; a header the file does not have answers 400. */
export function resolveMapping(headers: readonly string[], mapping: ColumnMapping): Partial<Record<MappingField, number>> {
  const issues: Array<{ path: string; message: string }> = [];
  const columns: Partial<Record<MappingField, number>> = {};
  for (const field of MAPPING_FIELDS) {
    const header = mapping[field];
    if (!header) continue;
    const index = headers.findIndex((candidate) => candidate.trim().toLowerCase() === header.trim().toLowerCase());
    if (index < 0) issues.push({ path: `mapping.${field}`, message: `The file has no column “${header}”.` });
    else columns[field] = index;
  }
  if (issues.length) throw new ValidationError(issues, 'The column mapping does not fit the file.');
  return columns;
}
