import { Field, Input, SearchBox, Select, Switch, makeStyles, tokens } from '@fluentui/react-components';
import { familyLabel, families, familySchema, partKindSchema } from '@linesmith/catalog';
import type { PartListFilters } from '../api/part-list-filters';
import type { Supplier } from '../api/supplier-schema';
import { partKindLabels } from '../utils/part-kind-labels';

export interface PartsToolbarProps {
  filters: PartListFilters;
  suppliers: readonly Supplier[];
  onChange(change: Partial<PartListFilters>): void;
}

const useStyles = makeStyles({
  bar: { display: 'flex', flexWrap: 'wrap', alignItems: 'flex-end', gap: tokens.spacingHorizontalL },
  search: { minWidth: '240px' },
  dash: { width: '90px' },
});

export function PartsToolbar({ filters, suppliers, onChange }: PartsToolbarProps) {
  const styles = useStyles();
  return (
    <div className={styles.bar} role="search">
      <Field label="Search">
        <SearchBox
          className={styles.search}
          placeholder="Description or part number"
          value={filters.search}
          onChange={(_, d) => onChange({ search: d.value })}
        />
      </Field>
      <Field label="Kind">
        <Select value={filters.kind ?? ''} onChange={(_, d) => onChange({ kind: partKindSchema.safeParse(d.value).data ?? null })}>
          <option value="">Any kind</option>
          {partKindSchema.options.map((kind) => (
            <option key={kind} value={kind}>
              {partKindLabels[kind]}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Family">
        <Select value={filters.family ?? ''} onChange={(_, d) => onChange({ family: familySchema.safeParse(d.value).data ?? null })}>
          <option value="">Any family</option>
          {families.map((family) => (
            <option key={family} value={family}>
              {familyLabel(family)}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Dash size">
        <Input className={styles.dash} placeholder="-6" value={filters.dash} onChange={(_, d) => onChange({ dash: d.value })} />
      </Field>
      <Field label="Supplier">
        <Select value={filters.supplierId ?? ''} onChange={(_, d) => onChange({ supplierId: d.value || null })}>
          <option value="">Any supplier</option>
          {suppliers.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </Select>
      </Field>
      <Switch label="Show retired parts" checked={filters.includeRetired} onChange={(_, d) => onChange({ includeRetired: d.checked })} />
    </div>
  );
}
