import { MessageBar, MessageBarBody, MessageBarTitle, makeStyles, tokens } from '@fluentui/react-components';
import { formatDateTime } from '../../users/utils/format-date-time';
import type { ShopProfile } from '../api/shop-profile-schema';
import type { ShopProfileFieldId } from '../utils/shop-profile-form-schema';

export interface ShopProfileConflictNoticeProps {
  current: ShopProfile;
  /** The fields the admin changed; the notice marks them. */
  changedByMe: readonly ShopProfileFieldId[];
}

const useStyles = makeStyles({
  list: { margin: `${tokens.spacingVerticalXS} 0`, paddingLeft: tokens.spacingHorizontalXL },
});

/** The profile as the server has it now, after someone else saved first. */
export function ShopProfileConflictNotice({ current, changedByMe }: ShopProfileConflictNoticeProps) {
  const styles = useStyles();
  const rows: { id: ShopProfileFieldId; label: string; value: string }[] = [
    { id: 'name', label: 'Shop name', value: current.name },
    { id: 'timezone', label: 'Time zone', value: current.timezone },
    { id: 'taxRatePercent', label: 'Sales tax rate', value: `${current.taxRatePercent} %` },
  ];
  return (
    <MessageBar intent="warning" layout="multiline" role="alert">
      <MessageBarBody>
        <MessageBarTitle>Someone else saved the shop profile first</MessageBarTitle>
        <div>Current values (saved {formatDateTime(current.updatedAt)}):</div>
        <ul className={styles.list} aria-label="Current values on the server">
          {rows.map((row) => (
            <li key={row.id}>
              {row.label}: {row.value}
              {changedByMe.includes(row.id) ? ' — you changed this field' : ''}
            </li>
          ))}
        </ul>
        <div>Re-apply your changes on top of these values, or use the current values and discard yours.</div>
      </MessageBarBody>
    </MessageBar>
  );
}
