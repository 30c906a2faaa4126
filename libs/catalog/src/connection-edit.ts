import type { ConnectionSpec } from './connections.js';
import { defaultSeat, hasSeatForms, seatOf } from './standards/seat-forms.js';
import { canonicalSize, listSizes } from './standards/tables.js';

/**
 * A connection after a picker changes one of its parts: a new family takes its usual seat form
 * (and loses a seat form it has none of); the size stays where the family and seat form have it,
 * else becomes the first size they are made in.
 */
export function changeConnection(spec: ConnectionSpec, change: Partial<ConnectionSpec>): ConnectionSpec {
  const next: ConnectionSpec = { ...spec, ...change };
  if (!hasSeatForms(next.family)) delete next.seat;
  else if (change.family !== undefined && change.family !== spec.family && change.seat === undefined) next.seat = defaultSeat(next.family);
  const sizes = listSizes(next.family, seatOf(next));
  if (!sizes.includes(canonicalSize(next.family, next.size))) next.size = sizes[0] ?? '';
  return next;
}
