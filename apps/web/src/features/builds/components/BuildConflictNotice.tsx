import { MessageBar, MessageBarBody, MessageBarTitle } from '@fluentui/react-components';
import { formatDateTime } from '../../users/utils/format-date-time';
import type { Build } from '../api/build-schema';
import { buildStatusLabels } from '../utils/build-status-labels';
import { vehicleTitle } from '../utils/vehicle-title';

export interface BuildConflictNoticeProps {
  current: Build;
}

/** The build as the server has it now, after someone else saved a change first. */
export function BuildConflictNotice({ current }: BuildConflictNoticeProps) {
  const { vehicle, customer } = current;
  const drivetrain = [vehicle.engine, vehicle.transmission].filter(Boolean).join(', ');
  return (
    <MessageBar intent="warning" layout="multiline" role="alert">
      <MessageBarBody>
        <MessageBarTitle>Someone else changed this build first</MessageBarTitle>
        <div>
          Current values (changed {formatDateTime(current.updatedAt)}): {vehicleTitle(vehicle)}
          {drivetrain ? ` (${drivetrain})` : ''} · {customer.name}
          {customer.phone ? `, ${customer.phone}` : ''}
          {customer.email ? `, ${customer.email}` : ''} · {buildStatusLabels[current.status]}.
        </div>
        <div>Retry to apply your changes on top of these, use the current values, or cancel.</div>
      </MessageBarBody>
    </MessageBar>
  );
}
