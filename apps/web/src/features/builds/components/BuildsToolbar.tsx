import { Dropdown, Field, Option, SearchBox, makeStyles, tokens } from '@fluentui/react-components';
import { forwardRef } from 'react';
import { buildStatusSchema, type BuildStatus } from '../api/build-schema';
import { buildStatusLabels } from '../utils/build-status-labels';

export interface BuildsToolbarProps {
  search: string;
  onSearchChange(search: string): void;
  status: BuildStatus | null;
  onStatusChange(status: BuildStatus | null): void;
}

const anyStatus = 'any';

const useStyles = makeStyles({
  bar: { display: 'flex', flexWrap: 'wrap', alignItems: 'flex-end', gap: tokens.spacingHorizontalL },
  search: { minWidth: '300px' },
});

/** Search (vehicle or customer text) and status filter; the search box is what `/` focuses. */
export const BuildsToolbar = forwardRef<HTMLInputElement, BuildsToolbarProps>(function BuildsToolbar(props, searchRef) {
  const styles = useStyles();
  return (
    <div className={styles.bar} role="search">
      <Field label="Search" hint="Press / to jump here">
        <SearchBox
          ref={searchRef}
          className={styles.search}
          placeholder="Vehicle or customer"
          value={props.search}
          onChange={(_, data) => props.onSearchChange(data.value)}
        />
      </Field>
      <Field label="Status">
        <Dropdown
          value={props.status ? buildStatusLabels[props.status] : 'Any status'}
          selectedOptions={[props.status ?? anyStatus]}
          onOptionSelect={(_, data) => {
            const parsed = buildStatusSchema.safeParse(data.optionValue);
            props.onStatusChange(parsed.success ? parsed.data : null);
          }}
        >
          <Option value={anyStatus}>Any status</Option>
          {buildStatusSchema.options.map((status) => (
            <Option key={status} value={status}>
              {buildStatusLabels[status]}
            </Option>
          ))}
        </Dropdown>
      </Field>
    </div>
  );
});
