import { Field, Radio, RadioGroup, Select, makeStyles, tokens } from '@fluentui/react-components';
import { families, familyLabel, listSizes, type ConnectionSpec, type Family, type Gender } from '@linesmith/catalog';

export interface ConnectionEndPickerProps {
  legend: string;
  value: ConnectionSpec;
  onChange(next: ConnectionSpec): void;
}

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalS,
    margin: 0,
    padding: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalM}`,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
    minWidth: '220px',
  },
  legend: { fontWeight: tokens.fontWeightSemibold, padding: `0 ${tokens.spacingHorizontalXS}` },
});

/** Family, size and gender of one connection end; sizes are those of the chosen family's table. */
export function ConnectionEndPicker({ legend, value, onChange }: ConnectionEndPickerProps) {
  const styles = useStyles();
  const sizes = listSizes(value.family);

  function changeFamily(family: Family) {
    const next = listSizes(family);
    // Keep the size where the new family has it (-6 flare → -6 O-ring boss), else its first size.
    onChange({ ...value, family, size: next.includes(value.size) ? value.size : (next[0] ?? '') });
  }

  return (
    <fieldset className={styles.root}>
      <legend className={styles.legend}>{legend}</legend>
      <Field label="Family">
        <Select value={value.family} onChange={(_, data) => changeFamily(data.value as Family)}>
          {families.map((family) => (
            <option key={family} value={family}>
              {familyLabel(family)}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Size">
        <Select value={value.size} onChange={(_, data) => onChange({ ...value, size: data.value })}>
          {sizes.map((size) => (
            <option key={size} value={size}>
              {size}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Gender">
        <RadioGroup
          layout="horizontal"
          value={value.gender}
          onChange={(_, data) => onChange({ ...value, gender: data.value as Gender })}
        >
          <Radio value="male" label="Male" />
          <Radio value="female" label="Female" />
        </RadioGroup>
      </Field>
    </fieldset>
  );
}
