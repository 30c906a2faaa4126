import { Dropdown, Field, Input, Option, Textarea, makeStyles, tokens } from '@fluentui/react-components';
import { buildStatusSchema } from '../api/build-schema';
import { buildStatusLabels } from '../utils/build-status-labels';
import { earliestModelYear, latestModelYear, type BuildFormInput } from '../utils/build-form-schema';

export type BuildFormErrors = Partial<Record<keyof BuildFormInput, string>>;

export interface BuildFormFieldsProps {
  values: BuildFormInput;
  errors: BuildFormErrors;
  onChange<K extends keyof BuildFormInput>(key: K, value: BuildFormInput[K]): void;
}

const useStyles = makeStyles({
  group: { border: 'none', margin: 0, padding: 0, display: 'grid', gap: tokens.spacingVerticalS },
  legend: { fontWeight: tokens.fontWeightSemibold, padding: 0, marginBottom: tokens.spacingVerticalXS },
  row: { display: 'grid', gridTemplateColumns: '1fr 2fr 2fr', gap: tokens.spacingHorizontalM },
  pair: { display: 'grid', gridTemplateColumns: '1fr 1fr', gap: tokens.spacingHorizontalM },
});

/** Vehicle, customer, notes and status fields shared by the create and edit dialogs. */
export function BuildFormFields({ values, errors, onChange }: BuildFormFieldsProps) {
  const styles = useStyles();
  return (
    <>
      <fieldset className={styles.group}>
        <legend className={styles.legend}>Vehicle</legend>
        <div className={styles.row}>
          <Field label="Year" validationMessage={errors.year} hint={`${earliestModelYear}–${latestModelYear()}`}>
            <Input inputMode="numeric" value={values.year} onChange={(_, d) => onChange('year', d.value)} />
          </Field>
          <Field label="Make" required validationMessage={errors.make}>
            <Input value={values.make} onChange={(_, d) => onChange('make', d.value)} />
          </Field>
          <Field label="Model" required validationMessage={errors.model}>
            <Input value={values.model} onChange={(_, d) => onChange('model', d.value)} />
          </Field>
        </div>
        <div className={styles.pair}>
          <Field label="Engine" validationMessage={errors.engine}>
            <Input value={values.engine} onChange={(_, d) => onChange('engine', d.value)} />
          </Field>
          <Field label="Transmission" validationMessage={errors.transmission}>
            <Input value={values.transmission} onChange={(_, d) => onChange('transmission', d.value)} />
          </Field>
        </div>
      </fieldset>
      <fieldset className={styles.group}>
        <legend className={styles.legend}>Customer</legend>
        <Field label="Customer name" required validationMessage={errors.customerName}>
          <Input value={values.customerName} onChange={(_, d) => onChange('customerName', d.value)} />
        </Field>
        <div className={styles.pair}>
          <Field label="Phone" validationMessage={errors.customerPhone}>
            <Input type="tel" value={values.customerPhone} onChange={(_, d) => onChange('customerPhone', d.value)} />
          </Field>
          <Field label="Customer e-mail" validationMessage={errors.customerEmail}>
            <Input type="email" value={values.customerEmail} onChange={(_, d) => onChange('customerEmail', d.value)} />
          </Field>
        </div>
      </fieldset>
      <Field label="Status">
        <Dropdown
          value={buildStatusLabels[values.status]}
          selectedOptions={[values.status]}
          onOptionSelect={(_, data) => {
            const parsed = buildStatusSchema.safeParse(data.optionValue);
            if (parsed.success) onChange('status', parsed.data);
          }}
        >
          {buildStatusSchema.options.map((status) => (
            <Option key={status} value={status}>
              {buildStatusLabels[status]}
            </Option>
          ))}
        </Dropdown>
      </Field>
      <Field label="Notes" validationMessage={errors.notes}>
        <Textarea resize="vertical" value={values.notes} onChange={(_, d) => onChange('notes', d.value)} />
      </Field>
    </>
  );
}
