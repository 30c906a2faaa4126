import type { FlagSeverity, FlagView } from '../api/check-schema';

export type FlagCounts = Record<FlagSeverity, number>;

export function countFlags(flags: readonly Pick<FlagView, 'severity'>[]): FlagCounts {
  const counts: FlagCounts = { blocker: 0, caution: 0, note: 0 };
  for (const flag of flags) counts[flag.severity] += 1;
  return counts;
}
