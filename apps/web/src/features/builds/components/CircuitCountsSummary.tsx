import type { CircuitCounts } from '../api/build-schema';

export interface CircuitCountsSummaryProps {
  counts: CircuitCounts;
}

const parts: [keyof Omit<CircuitCounts, 'total'>, string][] = [
  ['draft', 'draft'],
  ['inReview', 'in review'],
  ['returned', 'returned'],
  ['approved', 'approved'],
  ['ordered', 'ordered'],
  ['installed', 'installed'],
];

/** "3 circuits: 1 draft, 2 approved" — only the statuses that occur. */
export function CircuitCountsSummary({ counts }: CircuitCountsSummaryProps) {
  if (counts.total === 0) return <>No circuits</>;
  const detail = parts.filter(([key]) => counts[key] > 0).map(([key, label]) => `${counts[key]} ${label}`);
  return (
    <>
      {counts.total} {counts.total === 1 ? 'circuit' : 'circuits'}
      {detail.length > 0 ? `: ${detail.join(', ')}` : ''}
    </>
  );
}
