import { Checkbox, Field, Input, Select, Text, makeStyles, tokens } from '@fluentui/react-components';
import type { PartKind } from '@linesmith/catalog';
import type { AttributeValues } from '../utils/attribute-values';
import { attributeFields, type AttributeField } from '../utils/part-attribute-fields';
import { ConnectionPicker } from './ConnectionPicker';

export interface AttributeFieldsEditorProps {
  kind: PartKind;
  values: AttributeValues;
  errors: Record<string, string>;
  onChange(key: string, value: string | string[]): void;
}

const useStyles = makeStyles({
  grid: { display: 'grid', gridTemplateColumns: 'repeat(2, minmax(0, 1fr))', gap: tokens.spacingVerticalM },
  wide: { gridColumn: '1 / -1' },
  choices: { display: 'flex', flexWrap: 'wrap', columnGap: tokens.spacingHorizontalM },
  fieldset: { border: 'none', margin: 0, padding: 0 },
  error: { color: tokens.colorPaletteRedForeground1 },
});

const angles = [0, 45, 90, 120, 150, 180];

/** The kind-specific inputs of the part editor, one per field of `attributeFields[kind]`. */
export function AttributeFieldsEditor({ kind, values, errors, onChange }: AttributeFieldsEditorProps) {
  const styles = useStyles();
  const text = (key: string) => {
    const value = values[key];
    return typeof value === 'string' ? value : '';
  };
  const list = (key: string) => {
    const value = values[key];
    return Array.isArray(value) ? value : [];
  };

  function render(field: AttributeField) {
    const label = 'unit' in field && field.unit ? `${field.label} (${field.unit})` : field.label;
    switch (field.type) {
      case 'number':
        return (
          <Field key={field.key} label={label} required={!field.optional} validationMessage={errors[field.key]}>
            <Input inputMode="decimal" value={text(field.key)} onChange={(_, d) => onChange(field.key, d.value)} />
          </Field>
        );
      case 'text':
      case 'text-list':
        return (
          <Field key={field.key} label={label} hint={field.hint} required={field.type === 'text'} validationMessage={errors[field.key]}>
            <Input value={text(field.key)} onChange={(_, d) => onChange(field.key, d.value)} />
          </Field>
        );
      case 'choice':
        return (
          <Field key={field.key} label={label} required={!field.optional} validationMessage={errors[field.key]}>
            <Select value={text(field.key)} onChange={(_, d) => onChange(field.key, d.value)}>
              <option value="">{field.optional ? 'Not stated' : 'Choose…'}</option>
              {field.options.map((o) => (
                <option key={o.value} value={o.value}>
                  {o.label}
                </option>
              ))}
            </Select>
          </Field>
        );
      case 'angle':
        return (
          <Field key={field.key} label={`${label} (°)`} required validationMessage={errors[field.key]}>
            <Select value={text(field.key)} onChange={(_, d) => onChange(field.key, d.value)}>
              <option value="">Choose…</option>
              {angles.map((a) => (
                <option key={a} value={String(a)}>
                  {a === 0 ? 'Straight (0°)' : `${a}°`}
                </option>
              ))}
            </Select>
          </Field>
        );
      case 'multi-choice': {
        const selected = list(field.key);
        // A fieldset, not a Field: a Field would name every checkbox after the group's label.
        return (
          <fieldset key={field.key} className={`${styles.wide} ${styles.fieldset}`}>
            <legend>
              {label} {!field.optional && <span aria-hidden="true">*</span>}
            </legend>
            <div className={styles.choices}>
              {field.options.map((o) => (
                <Checkbox
                  key={o.value}
                  label={o.label}
                  checked={selected.includes(o.value)}
                  onChange={(_, d) =>
                    onChange(field.key, d.checked ? [...selected, o.value] : selected.filter((v) => v !== o.value))
                  }
                />
              ))}
            </div>
            {errors[field.key] && (
              <Text role="alert" size={200} className={styles.error}>
                {errors[field.key]}
              </Text>
            )}
          </fieldset>
        );
      }
      case 'connection':
        return (
          <div key={field.key} className={styles.wide}>
            <ConnectionPicker
              label={field.label}
              family={text(`${field.key}.family`)}
              size={text(`${field.key}.size`)}
              gender={text(`${field.key}.gender`)}
              seat={text(`${field.key}.seat`)}
              errors={{
                family: errors[`${field.key}.family`],
                size: errors[`${field.key}.size`],
                gender: errors[`${field.key}.gender`],
                seat: errors[`${field.key}.seat`],
              }}
              onChange={(sub, value) => onChange(`${field.key}.${sub}`, value)}
            />
          </div>
        );
      case 'seal': {
        const type = text(`${field.key}.type`);
        return (
          <div key={field.key} className={styles.grid + ' ' + styles.wide}>
            <Field label={field.label} validationMessage={errors[`${field.key}.type`]} required={kind === 'seal'}>
              <Select value={type} onChange={(_, d) => onChange(`${field.key}.type`, d.value)}>
                <option value="">{kind === 'seal' ? 'Choose…' : 'None'}</option>
                <option value="o-ring">O-ring</option>
                <option value="crush-washer">Crush washer</option>
                <option value="bonded-washer">Bonded washer</option>
              </Select>
            </Field>
            {type && (
              <Field
                label={type === 'o-ring' ? 'AS568 dash number (or ISO name)' : 'Washer size (thread it fits, e.g. M14 or 1/2 BSP)'}
                required
                validationMessage={errors[`${field.key}.value`]}
              >
                <Input value={text(`${field.key}.value`)} onChange={(_, d) => onChange(`${field.key}.value`, d.value)} />
              </Field>
            )}
          </div>
        );
      }
    }
  }

  return <div className={styles.grid}>{attributeFields[kind].map(render)}</div>;
}
