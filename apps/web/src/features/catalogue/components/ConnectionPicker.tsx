import { Field, Select, makeStyles, tokens } from '@fluentui/react-components';
import { defaultSeat, familyLabel, families, listSizes, seatFormsOf, type Family, type SeatForm } from '@linesmith/catalog';

export interface ConnectionPickerProps {
  label: string;
  family: string;
  size: string;
  gender: string;
  /** Seat form, for metric and BSP parallel ends; blank means the family's usual one. */
  seat?: string;
  errors: { family?: string; size?: string; gender?: string; seat?: string };
  onChange(sub: 'family' | 'size' | 'gender' | 'seat', value: string): void;
}

const useStyles = makeStyles({
  group: { display: 'grid', gridTemplateColumns: '2fr 1fr 1fr', gap: tokens.spacingHorizontalS, border: 'none', padding: 0, margin: 0 },
  seat: { gridColumn: '1 / -1' },
  legend: { paddingBottom: tokens.spacingVerticalXS, fontWeight: tokens.fontWeightSemibold },
});

function isFamily(value: string): value is Family {
  return (families as readonly string[]).includes(value);
}

/**
 * Family, size, gender and — for metric and BSP parallel ends — seat form of one connection;
 * sizes come from the family's thread table (only those made in the chosen seat form).
 */
export function ConnectionPicker({ label, family, size, gender, seat = '', errors, onChange }: ConnectionPickerProps) {
  const styles = useStyles();
  const seats = isFamily(family) ? seatFormsOf(family) : [];
  const chosenSeat = seats.find((s) => s.seat === seat)?.seat as SeatForm | undefined;
  const sizes = isFamily(family) ? listSizes(family, chosenSeat ?? defaultSeat(family)) : [];
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
            onChange('seat', '');
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
      {seats.length > 0 && (
        <Field className={styles.seat} label="Seat form" validationMessage={errors.seat}>
          <Select
            aria-label={`${label} seat form`}
            value={chosenSeat ?? ''}
            onChange={(_, d) => {
              onChange('seat', d.value);
              if (d.value && size && !listSizes(family as Family, d.value as SeatForm).includes(size)) onChange('size', '');
            }}
          >
            <option value="">Usual for the family ({seats[0].label})</option>
            {seats.map((s) => (
              <option key={s.seat} value={s.seat}>
                {s.label}
              </option>
            ))}
          </Select>
        </Field>
      )}
    </fieldset>
  );
}
