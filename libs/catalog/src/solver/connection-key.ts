import type { ConnectionSpec, Gender } from '../connections.js';
import { canonicalSize, isValidSize } from '../standards/tables.js';

/** Canonical identity of a connection end: "orb|-6|male". */
export function connectionKey(spec: ConnectionSpec): string {
  return `${spec.family}|${canonicalSize(spec.family, spec.size)}|${spec.gender}`;
}

const opposite: Readonly<Record<Gender, Gender>> = { male: 'female', female: 'male' };

/**
 * Key of the only end that can mate with this one (same family and size, other gender), or
 * undefined when nothing can (a barb, or a size not in the tables). Mirrors mate()'s "ok" case.
 */
export function matingKey(spec: ConnectionSpec): string | undefined {
  if (spec.family === 'barb' || !isValidSize(spec.family, spec.size)) return undefined;
  return connectionKey({ ...spec, gender: opposite[spec.gender] });
}
