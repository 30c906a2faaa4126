import { Button, Input, Label, Select, TableCell, TableRow, Text, makeStyles, tokens, useId } from '@fluentui/react-components';
import { ArrowResetRegular } from '@fluentui/react-icons';
import type { ShopRuleField } from '../utils/shop-rule-fields';
import { ruleUnitSuffix, ruleValueText } from '../utils/rule-value-text';

export interface ShopRuleRowProps {
  field: ShopRuleField;
  value: string;
  error: string | undefined;
  defaultText: string;
  /** The default's origin in words ("Common practice: …", "FAA AC 43.13-1B, chapter 9: …"). */
  origin: string;
  readOnly: boolean;
  isDefault: boolean;
  onChange(value: string): void;
  onReset(): void;
}

const useStyles = makeStyles({
  label: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS },
  value: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXXS, minWidth: '130px' },
  input: { width: '130px' },
  error: { color: tokens.colorPaletteRedForeground1 },
  muted: { color: tokens.colorNeutralForeground2 },
});

/** One shop rule: its value with the unit, the default and where the default comes from. */
export function ShopRuleRow({
  field,
  value,
  error,
  defaultText,
  origin,
  readOnly,
  isDefault,
  onChange,
  onReset,
}: ShopRuleRowProps) {
  const styles = useStyles();
  const inputId = useId('shop-rule');
  const errorId = `${inputId}-error`;
  const helpId = `${inputId}-help`;
  return (
    <TableRow>
      <TableCell>
        <span className={styles.label}>
          <Label htmlFor={inputId} weight="semibold">
            {field.label}
          </Label>
          <Text id={helpId} size={200} className={styles.muted}>
            {field.help}
          </Text>
        </span>
      </TableCell>
      <TableCell>
        <span className={styles.value}>
          {field.choices ? (
            <Select
              id={inputId}
              className={styles.input}
              size="small"
              value={value}
              disabled={readOnly}
              aria-invalid={error ? true : undefined}
              aria-describedby={error ? `${errorId} ${helpId}` : helpId}
              onChange={(_, data) => onChange(data.value)}
            >
              {/* Option values are the texts the form parses, so a choice saves like a typed value. */}
              {field.choices.map((choice) => ruleValueText(choice, field.unit)).map((text) => (
                <option key={text} value={text}>
                  {text} {ruleUnitSuffix(field.unit)}
                </option>
              ))}
            </Select>
          ) : (
            <Input
              id={inputId}
              className={styles.input}
              size="small"
              value={value}
              readOnly={readOnly}
              inputMode="decimal"
              contentAfter={<Text size={200}>{ruleUnitSuffix(field.unit)}</Text>}
              aria-invalid={error ? true : undefined}
              aria-describedby={error ? `${errorId} ${helpId}` : helpId}
              onChange={(_, data) => onChange(data.value)}
            />
          )}
          {error && (
            <Text id={errorId} size={200} className={styles.error}>
              {error}
            </Text>
          )}
        </span>
      </TableCell>
      <TableCell>{defaultText}</TableCell>
      <TableCell>
        <Text size={200}>{origin}</Text>
      </TableCell>
      <TableCell>
        {!readOnly && (
          <Button
            size="small"
            appearance="subtle"
            icon={<ArrowResetRegular />}
            disabled={isDefault}
            aria-label={`Reset ${field.label} to default`}
            onClick={onReset}
          >
            Reset
          </Button>
        )}
      </TableCell>
    </TableRow>
  );
}
