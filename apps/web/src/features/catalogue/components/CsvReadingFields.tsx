import { Field, Select, Text, makeStyles, tokens } from '@fluentui/react-components';
import type { CsvReadingChoice, PriceListReading } from '../api/price-list-schemas';

export interface CsvReadingFieldsProps {
  readAs: PriceListReading;
  disabled: boolean;
  /** Called with the new choice; the file is then read again with it. */
  onChange(choice: CsvReadingChoice): void;
  choice: CsvReadingChoice;
}

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  row: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalL },
});

/**
 * How the API read the file, in its words; for a CSV, the text encoding and separator it used,
 * each of which may be changed when the columns or letters come out wrong.
 */
export function CsvReadingFields({ readAs, disabled, onChange, choice }: CsvReadingFieldsProps) {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      <Text role="status">{readAs.summary}</Text>
      {readAs.format === 'csv' && (
        <div className={styles.row}>
          <Field label="Text encoding" hint={readAs.encodingDetected ? 'Detected from the file' : 'As chosen'}>
            <Select value={readAs.encoding} disabled={disabled} onChange={(_, d) => onChange({ ...choice, encoding: d.value })}>
              {readAs.choices.encodings.map((option) => (
                <option key={option.value} value={option.value}>
                  {option.label}
                </option>
              ))}
            </Select>
          </Field>
          <Field label="Separator" hint={readAs.delimiterDetected ? 'Detected from the file' : 'As chosen'}>
            <Select value={readAs.delimiter} disabled={disabled} onChange={(_, d) => onChange({ ...choice, delimiter: d.value })}>
              {readAs.choices.delimiters.map((option) => (
                <option key={option.value} value={option.value}>
                  {option.label}
                </option>
              ))}
            </Select>
          </Field>
        </div>
      )}
    </div>
  );
}
