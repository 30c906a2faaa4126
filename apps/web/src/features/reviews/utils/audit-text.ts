import type { AuditEntry } from '../api/review-schemas';

const actionLabels: Readonly<Record<string, string>> = {
  submitted: 'Submitted for review',
  submit: 'Submitted for review',
  acknowledged: 'Acknowledged a caution',
  acknowledge: 'Acknowledged a caution',
  'caution-acknowledged': 'Acknowledged a caution',
  approved: 'Approved',
  approve: 'Approved',
  returned: 'Returned to the fabricator',
  return: 'Returned to the fabricator',
  'revision-saved': 'Saved a revision',
};

/** The audit action in words; an action this version does not know is shown as the server names it. */
export function auditActionLabel(action: string): string {
  return actionLabels[action] ?? action.replace(/[-_.]/g, ' ').replace(/^./, (c) => c.toUpperCase());
}

/** The note, comments or message an audit entry carries, if any. */
export function auditDetailText(entry: AuditEntry): string {
  const details = entry.details;
  if (typeof details === 'string') return details;
  if (!details || typeof details !== 'object') return '';
  const record = details as Record<string, unknown>;
  return ['note', 'comments', 'message']
    .map((key) => record[key])
    .filter((value): value is string => typeof value === 'string' && value.trim() !== '')
    .join(' — ');
}

/** True for an entry that signs a revision off. */
export const isApproval = (entry: AuditEntry) => auditActionLabel(entry.action) === 'Approved';

/** The newest revision signed off before `revisionNumber`, for "what changed since the last sign-off". */
export function lastSignedOffBefore(entries: readonly AuditEntry[], revisionNumber: number): number | null {
  const signed = entries
    .filter((e) => isApproval(e) && e.revisionNumber !== null && e.revisionNumber < revisionNumber)
    .map((e) => e.revisionNumber as number);
  return signed.length > 0 ? Math.max(...signed) : null;
}
