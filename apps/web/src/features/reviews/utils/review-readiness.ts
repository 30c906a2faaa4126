import { flagKey, type Flag } from '@linesmith/routing';
import type { Acknowledgement } from '../api/review-schemas';

export interface CautionState {
  key: string;
  flag: Flag;
  /** Further flags of the same key (e.g. two narrow fittings on one line): the one acknowledgement covers them too, so the reviewer must see them. */
  alsoFlags: Flag[];
  acknowledgement: Acknowledgement | null;
}

export interface ReviewReadiness {
  blockers: Flag[];
  cautions: CautionState[];
  notes: Flag[];
  openCautions: number;
  /** Approval needs no blocker and every caution acknowledged (DOMAIN §5; the server checks it too). */
  canApprove: boolean;
}

/** What stands between a submitted revision and its sign-off. */
export function reviewReadiness(flags: readonly Flag[], acknowledgements: readonly Acknowledgement[]): ReviewReadiness {
  const byKey = new Map(acknowledgements.map((a) => [a.flagKey, a]));
  const blockers = flags.filter((f) => f.severity === 'blocker');
  const notes = flags.filter((f) => f.severity === 'note');
  const byFlagKey = new Map<string, CautionState>();
  for (const flag of flags) {
    if (flag.severity !== 'caution') continue;
    const key = flagKey(flag);
    const same = byFlagKey.get(key);
    // One acknowledgement answers every flag of the same key.
    if (same) same.alsoFlags.push(flag);
    else byFlagKey.set(key, { key, flag, alsoFlags: [], acknowledgement: byKey.get(key) ?? null });
  }
  const cautions = [...byFlagKey.values()];
  const openCautions = cautions.filter((c) => c.acknowledgement === null).length;
  return { blockers, cautions, notes, openCautions, canApprove: blockers.length === 0 && openCautions === 0 };
}
