import { Checkbox, Field, makeStyles, tokens } from '@fluentui/react-components';
import { roleSchema, type Role } from '../../../lib/contract/role-schema';
import { roleLabels } from '../../auth/utils/role-labels';

export interface RoleCheckboxesProps {
  value: readonly Role[];
  onChange(next: Role[]): void;
  error?: string;
  disabled?: boolean;
}

const roleHints: Record<Role, string> = {
  admin: 'users, roles, suppliers and shop rules',
  fabricator: 'builds, circuits and sketches',
  'parts-clerk': 'catalogue, stock and orders',
  reviewer: 'sign-off of submitted circuits',
};

const useStyles = makeStyles({
  group: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
});

export function RoleCheckboxes({ value, onChange, error, disabled }: RoleCheckboxesProps) {
  const styles = useStyles();
  function toggle(role: Role, checked: boolean) {
    const next = new Set(value);
    if (checked) next.add(role);
    else next.delete(role);
    // Keep the contract's order so a diff of roles is stable.
    onChange(roleSchema.options.filter((r) => next.has(r)));
  }
  return (
    <Field label="Roles" required validationMessage={error}>
      <div role="group" aria-label="Roles" className={styles.group}>
        {roleSchema.options.map((role) => (
          <Checkbox
            key={role}
            label={`${roleLabels[role]} — ${roleHints[role]}`}
            checked={value.includes(role)}
            disabled={disabled}
            onChange={(_, data) => toggle(role, data.checked === true)}
          />
        ))}
      </div>
    </Field>
  );
}
