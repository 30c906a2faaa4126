/**
 * Structural equality of plain JSON-like data. Key order is ignored (PostgreSQL's jsonb reorders
 * keys) and a key holding `undefined` counts as absent (an optional field left out).
 */
export function sameValue(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  if (Array.isArray(a)) {
    const other = b as unknown[];
    return a.length === other.length && a.every((item, i) => sameValue(item, other[i]));
  }
  const keysOf = (value: object) => Object.keys(value).filter((key) => (value as Record<string, unknown>)[key] !== undefined);
  const [keysA, keysB] = [keysOf(a), keysOf(b)];
  if (keysA.length !== keysB.length) return false;
  const recordA = a as Record<string, unknown>;
  const recordB = b as Record<string, unknown>;
  return keysA.every((key) => Object.hasOwn(recordB, key) && sameValue(recordA[key], recordB[key]));
}
