import { Dropdown, Field, Option, SearchBox, Switch, makeStyles, tokens } from '@fluentui/react-components';
import { roleSchema, type Role } from '../../../lib/contract/role-schema';
import { roleLabels } from '../../auth/utils/role-labels';

export interface UsersToolbarProps {
  search: string;
  onSearchChange(search: string): void;
  role: Role | null;
  onRoleChange(role: Role | null): void;
  showInactive: boolean;
  onShowInactiveChange(showInactive: boolean): void;
}

const anyRole = 'any';

const useStyles = makeStyles({
  bar: { display: 'flex', flexWrap: 'wrap', alignItems: 'flex-end', gap: tokens.spacingHorizontalL },
  search: { minWidth: '260px' },
});

export function UsersToolbar(props: UsersToolbarProps) {
  const styles = useStyles();
  const selected = props.role ?? anyRole;
  return (
    <div className={styles.bar} role="search">
      <Field label="Search">
        <SearchBox
          className={styles.search}
          placeholder="Name or e-mail"
          value={props.search}
          onChange={(_, data) => props.onSearchChange(data.value)}
        />
      </Field>
      <Field label="Role">
        <Dropdown
          value={props.role ? roleLabels[props.role] : 'Any role'}
          selectedOptions={[selected]}
          onOptionSelect={(_, data) => {
            const parsed = roleSchema.safeParse(data.optionValue);
            props.onRoleChange(parsed.success ? parsed.data : null);
          }}
        >
          <Option value={anyRole}>Any role</Option>
          {roleSchema.options.map((role) => (
            <Option key={role} value={role}>
              {roleLabels[role]}
            </Option>
          ))}
        </Dropdown>
      </Field>
      <Switch
        label="Show inactive users"
        checked={props.showInactive}
        onChange={(_, data) => props.onShowInactiveChange(data.checked)}
      />
    </div>
  );
}
