import type { BuildStatus } from '../api/build-schema';

export const buildStatusLabels: Readonly<Record<BuildStatus, string>> = {
  open: 'Open',
  'on-hold': 'On hold',
  done: 'Done',
};
