import type { Flag } from './flag.js';

/**
 * A stable key of a flag: its code and the item it points at, never the message (messages carry
 * numbers that move with the route). A reviewer's acknowledgement is stored against this key, so a
 * re-evaluation of the same revision finds it again.
 * Examples: `support-gap@line:L1`, `joint-seat@joint:L1:from:0`, `open-port@port:cooler/out`,
 * `bend-radius@line:L1#2` (corner 2).
 */
export function flagKey(flag: Pick<Flag, 'code' | 'target'>): string {
  const { kind, id, unitId, index } = flag.target;
  // Port ids are unique per unit only; joint ids already spell out line, end and index.
  const item = unitId !== undefined && !id.startsWith(`${unitId}/`) ? `${unitId}/${id}` : id;
  const at = kind !== 'joint' && index !== undefined ? `#${index}` : '';
  return `${flag.code}@${kind}:${item}${at}`;
}
