import { MessageBar, MessageBarBody, MessageBarTitle, makeStyles, tokens } from '@fluentui/react-components';
import { formatDateTime } from '../../users/utils/format-date-time';
import type { ShopRulesRecord } from '../api/shop-rules-record-schema';
import type { ShopRuleFieldId } from '../utils/shop-rule-fields';
import { readRuleValue, shopRuleFields } from '../utils/shop-rule-fields';
import { ruleValueDisplay } from '../utils/rule-value-text';

export interface ShopRulesConflictNoticeProps {
  current: ShopRulesRecord;
  /** The fields the admin changed; the notice says which of them someone else changed too. */
  changedByMe: readonly ShopRuleFieldId[];
}

const useStyles = makeStyles({
  list: { margin: `${tokens.spacingVerticalXS} 0`, paddingLeft: tokens.spacingHorizontalXL },
});

/** The rules as the server has them now, after someone else saved first. */
export function ShopRulesConflictNotice({ current, changedByMe }: ShopRulesConflictNoticeProps) {
  const styles = useStyles();
  return (
    <MessageBar intent="warning" layout="multiline" role="alert">
      <MessageBarBody>
        <MessageBarTitle>Someone else saved the shop rules first</MessageBarTitle>
        <div>
          Current values{current.updatedAt ? ` (saved ${formatDateTime(current.updatedAt)})` : ''}:
        </div>
        <ul className={styles.list} aria-label="Current values on the server">
          {shopRuleFields.map((field) => (
            <li key={field.id}>
              {field.label}: {ruleValueDisplay(readRuleValue(current.rules, field), field.unit)}
              {changedByMe.includes(field.id) ? ' — you changed this field' : ''}
            </li>
          ))}
        </ul>
        <div>Re-apply your changes on top of these values, or use the current values and discard yours.</div>
      </MessageBarBody>
    </MessageBar>
  );
}
