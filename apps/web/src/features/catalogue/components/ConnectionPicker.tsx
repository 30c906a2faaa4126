import { Field, Select, makeStyles, tokens } from '@fluentui/react-components';
import { familyLabel, families, listSizes, type Family } from '@linesmith/catalog';

export interface ConnectionPickerProps {
  label: string;
  family: string;
  size: string;
  gender: string;
  errors: { family?: string; size?: string; gender?: string };
  onChange(sub: 'family' | 'size' | 'gender', value: string): void;
}

const useStyles = makeStyles({
  group: { display: 'grid', gridTemplateColumns: '2fr 1fr 1fr', gap: tokens.spacingHorizontalS, border: 'none', padding: 0, margin: 0 },
  legend: { paddingBottom: tokens.spacingVerticalXS, fontWeight: tokens.fontWeightSemibold },
});

function isFamily(value: string): value is Family {
  return (families as readonly string[]).includes(value);
}

/** Family, size and gender of one connection; sizes come from the family's thread table. */
export function ConnectionPicker({ label, family, size, gender, errors, onChange }: ConnectionPickerProps) {
  const styles = useStyles();
  const sizes = isFamily(family) ? listSizes(family) : [];
  return (
    <fieldset className={styles.group}>
      <legend className={styles.legend}>{label}</legend>
      <Field label="Family" validationMessage={errors.family}>
        <Select
          aria-label={`${label} family`}
          value={family}
          onChange={(_, d) => {
            onChange('family', d.value);
            onChange('size', '');
          }}
        >
          <option value="">Choose…</option>
          {families.map((f) => (
            <option key={f} value={f}>
              {familyLabel(f)}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Size" validationMessage={errors.size}>
        <Select aria-label={`${label} size`} value={size} disabled={sizes.length === 0} onChange={(_, d) => onChange('size', d.value)}>
          <option value="">Choose…</option>
          {sizes.map((s) => (
            <option key={s} value={s}>
              {s}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Gender" validationMessage={errors.gender}>
        <Select aria-label={`${label} gender`} value={gender} onChange={(_, d) => onChange('gender', d.value)}>
          <option value="">Choose…</option>
          <option value="male">Male</option>
          <option value="female">Female</option>
        </Select>
      </Field>
    </fieldset>
  );
}
