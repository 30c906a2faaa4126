import { Badge } from '@fluentui/react-components';
import { CheckmarkCircleRegular, CircleRegular, PauseCircleRegular } from '@fluentui/react-icons';
import type { BuildStatus } from '../api/build-schema';
import { buildStatusLabels } from '../utils/build-status-labels';

export interface BuildStatusBadgeProps {
  status: BuildStatus;
}

const look = {
  open: { color: 'brand', icon: <CircleRegular /> },
  'on-hold': { color: 'warning', icon: <PauseCircleRegular /> },
  done: { color: 'success', icon: <CheckmarkCircleRegular /> },
} as const;

/** Status by icon and text, not colour alone. */
export function BuildStatusBadge({ status }: BuildStatusBadgeProps) {
  return (
    <Badge appearance="tint" color={look[status].color} icon={look[status].icon}>
      {buildStatusLabels[status]}
    </Badge>
  );
}
