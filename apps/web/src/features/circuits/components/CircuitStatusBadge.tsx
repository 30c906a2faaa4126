import { Badge, type BadgeProps } from '@fluentui/react-components';
import {
  ArrowUndoRegular,
  BoxCheckmarkRegular,
  CheckmarkCircleRegular,
  ClipboardTaskRegular,
  DraftsRegular,
  WrenchRegular,
} from '@fluentui/react-icons';
import type { ReactElement } from 'react';
import type { CircuitStatus } from '../api/circuit-schema';
import { circuitStatusLabels } from '../utils/circuit-status-labels';

export interface CircuitStatusBadgeProps {
  status: CircuitStatus;
}

const look: Record<CircuitStatus, { color: BadgeProps['color']; icon: ReactElement }> = {
  draft: { color: 'informative', icon: <DraftsRegular /> },
  'in-review': { color: 'brand', icon: <ClipboardTaskRegular /> },
  returned: { color: 'warning', icon: <ArrowUndoRegular /> },
  approved: { color: 'success', icon: <CheckmarkCircleRegular /> },
  ordered: { color: 'important', icon: <BoxCheckmarkRegular /> },
  installed: { color: 'success', icon: <WrenchRegular /> },
};

/** Status by icon and text as well as colour. */
export function CircuitStatusBadge({ status }: CircuitStatusBadgeProps) {
  return (
    <Badge appearance="tint" color={look[status].color} icon={look[status].icon}>
      {circuitStatusLabels[status]}
    </Badge>
  );
}
