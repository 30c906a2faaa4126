import { Field, Radio, RadioGroup, Select, makeStyles, tokens } from '@fluentui/react-components';
import {
  changeConnection,
  families,
  familyLabel,
  listSizes,
  seatFormsOf,
  seatOf,
  type ConnectionSpec,
  type Family,
  type Gender,
  type SeatForm,
} from '@linesmith/catalog';

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

/**
 * Family, size, gender and (for metric and BSP parallel) seat form of one connection end; sizes
 * are those of the chosen family's table made in the chosen seat form.
 */
export function ConnectionEndPicker({ legend, value, onChange }: ConnectionEndPickerProps) {
  const styles = useStyles();
  const seats = seatFormsOf(value.family);
  const sizes = listSizes(value.family, seatOf(value));

  // Keeps the size where the new family has it (-6 flare → -6 O-ring boss), else its first size.
  const changeFamily = (family: Family) => onChange(changeConnection(value, { family }));

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
      {seats.length > 0 && (
        <Field label="Seat form">
          <Select value={seatOf(value)} onChange={(_, data) => onChange(changeConnection(value, { seat: data.value as SeatForm }))}>
            {seats.map((s) => (
              <option key={s.seat} value={s.seat}>
                {s.label}
              </option>
            ))}
          </Select>
        </Field>
      )}
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
