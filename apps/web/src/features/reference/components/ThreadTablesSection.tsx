import { Field, Radio, RadioGroup, Select, Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import type { Family } from '@linesmith/catalog';
import type { LengthUnit } from '@linesmith/routing';
import { useState } from 'react';
import { useFamilies } from '../hooks/useFamilies';
import { useThreadTable } from '../hooks/useThreadTable';
import { QueryErrorBar } from './QueryErrorBar';
import { ThreadTableView } from './ThreadTableView';

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  controls: { display: 'flex', flexWrap: 'wrap', alignItems: 'flex-end', gap: tokens.spacingHorizontalXL },
  picker: { minWidth: '220px' },
});

/** Thread tables by family, with their sources, in fractional inch or millimetres. */
export function ThreadTablesSection() {
  const styles = useStyles();
  const families = useFamilies();
  const [chosen, setChosen] = useState<Family | null>(null);
  const [unit, setUnit] = useState<LengthUnit>('in');
  const family = chosen ?? families.data?.[0]?.family ?? null;
  const table = useThreadTable(family);

  if (families.isPending) return <Spinner size="small" label="Loading the thread families…" />;
  if (families.isError) {
    return <QueryErrorBar what="The thread families" error={families.error} onRetry={() => void families.refetch()} />;
  }
  if (families.data.length === 0) return <Text as="p">No thread families are available from the server.</Text>;

  return (
    <div className={styles.root}>
      <div className={styles.controls}>
        <Field label="Family" className={styles.picker}>
          <Select value={family ?? ''} onChange={(_, data) => setChosen(data.value as Family)}>
            {families.data.map((option) => (
              <option key={option.family} value={option.family}>
                {option.label}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Units">
          <RadioGroup layout="horizontal" value={unit} onChange={(_, data) => setUnit(data.value as LengthUnit)}>
            <Radio value="in" label="Fractional inch" />
            <Radio value="mm" label="Millimetres" />
          </RadioGroup>
        </Field>
      </div>
      {table.isPending && <Spinner size="small" label="Loading the thread table…" />}
      {table.isError && (
        <QueryErrorBar what="The thread table" error={table.error} onRetry={() => void table.refetch()} />
      )}
      {table.data && table.data.rows.length === 0 && <Text as="p">This family has no sizes in the tables.</Text>}
      {table.data && table.data.rows.length > 0 && <ThreadTableView table={table.data} unit={unit} />}
    </div>
  );
}
