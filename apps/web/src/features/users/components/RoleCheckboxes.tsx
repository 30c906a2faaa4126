import { Checkbox, Text, makeStyles, tokens, useId } from '@fluentui/react-components';
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
  // A fieldset, not a Fluent Field: a Field would label every checkbox "Roles".
  group: { display: 'flex', flexDirection: 'column', border: 'none', margin: 0, padding: 0 },
  legend: { padding: 0, marginBottom: tokens.spacingVerticalXXS },
  required: { color: tokens.colorPaletteRedForeground3, paddingLeft: tokens.spacingHorizontalXXS },
  error: { color: tokens.colorPaletteRedForeground1 },
});

export function RoleCheckboxes({ value, onChange, error, disabled }: RoleCheckboxesProps) {
  const styles = useStyles();
  const errorId = useId('roles-error');
  function toggle(role: Role, checked: boolean) {
    const next = new Set(value);
    if (checked) next.add(role);
    else next.delete(role);
    // Keep the contract's order so the roles sent are stable.
    onChange(roleSchema.options.filter((r) => next.has(r)));
  }
  return (
    <fieldset className={styles.group} aria-describedby={error ? errorId : undefined} aria-invalid={error ? true : undefined}>
      <legend className={styles.legend}>
        <Text weight="semibold">Roles</Text>
        <span className={styles.required} aria-hidden="true">
          *
        </span>
      </legend>
      {roleSchema.options.map((role) => (
        <Checkbox
          key={role}
          label={`${roleLabels[role]} — ${roleHints[role]}`}
          checked={value.includes(role)}
          disabled={disabled}
          onChange={(_, data) => toggle(role, data.checked === true)}
        />
      ))}
      {error && (
        <Text id={errorId} size={200} className={styles.error}>
          {error}
        </Text>
      )}
    </fieldset>
  );
}
