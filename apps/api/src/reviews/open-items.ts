import { flagKey, type Flag } from '@linesmith/routing';

/** A flag with its stable key, as the review screens and the approval check use it. */
export type KeyedFlag = Flag & { key: string };

/** What still stands between a revision and its sign-off. */
export interface OpenItems {
  blockers: KeyedFlag[];
  unacknowledgedCautions: KeyedFlag[];
}

export function keyed(flag: Flag): KeyedFlag {
  return { ...flag, key: flagKey(flag) };
}

/** Blockers always stay open (only the fabricator can fix them); a caution closes with an acknowledgement. Notes never block. */
export function openItemsOf(flags: readonly Flag[], acknowledgedKeys: ReadonlySet<string>): OpenItems {
  const all = flags.map(keyed);
  return {
    blockers: all.filter((flag) => flag.severity === 'blocker'),
    unacknowledgedCautions: all.filter((flag) => flag.severity === 'caution' && !acknowledgedKeys.has(flag.key)),
  };
}

export function isClear(items: OpenItems): boolean {
  return items.blockers.length === 0 && items.unacknowledgedCautions.length === 0;
}

export function countFlags(flags: readonly Flag[]): { blockers: number; cautions: number } {
  return {
    blockers: flags.filter((flag) => flag.severity === 'blocker').length,
    cautions: flags.filter((flag) => flag.severity === 'caution').length,
  };
}
