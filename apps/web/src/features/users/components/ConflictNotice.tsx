import { MessageBar, MessageBarBody, MessageBarTitle } from '@fluentui/react-components';
import { roleLabels } from '../../auth/utils/role-labels';
import type { User } from '../api/user-schema';
import { formatDateTime } from '../utils/format-date-time';

export interface ConflictNoticeProps {
  current: User;
}

/** Shows the row as the server has it now, after someone else changed it first. */
export function ConflictNotice({ current }: ConflictNoticeProps) {
  return (
    <MessageBar intent="warning" layout="multiline" role="alert">
      <MessageBarBody>
        <MessageBarTitle>Someone else changed this user first</MessageBarTitle>
        <div>
          Current values (changed {formatDateTime(current.updatedAt)}): {current.displayName} ·{' '}
          {current.roles.map((role) => roleLabels[role]).join(', ')} · {current.active ? 'active' : 'inactive'}.
        </div>
        <div>Check them, then retry to apply your change on top, or cancel.</div>
      </MessageBarBody>
    </MessageBar>
  );
}
