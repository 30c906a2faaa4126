import type { CircuitStatus } from '../api/circuit-schema';

export const circuitStatusLabels: Readonly<Record<CircuitStatus, string>> = {
  draft: 'Draft',
  'in-review': 'In review',
  returned: 'Returned',
  approved: 'Approved',
  ordered: 'Ordered',
  installed: 'Installed',
};
