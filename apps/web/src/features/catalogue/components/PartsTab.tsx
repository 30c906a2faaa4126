import { Button, MessageBar, MessageBarActions, MessageBarBody, Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import { AddRegular } from '@fluentui/react-icons';
import { useState } from 'react';
import { useDebouncedValue } from '../../../lib/useDebouncedValue';
import { defaultPartListFilters, type PartListFilters } from '../api/part-list-filters';
import type { PartRecord } from '../api/part-record-schema';
import type { Supplier } from '../api/supplier-schema';
import { usePartsList } from '../hooks/usePartsList';
import { PartEditorDialog } from './PartEditorDialog';
import { PartsTable } from './PartsTable';
import { PartsToolbar } from './PartsToolbar';
import { RetirePartDialog } from './RetirePartDialog';
import { StockDialog } from './StockDialog';

export interface PartsTabProps {
  suppliers: readonly Supplier[];
  canEdit: boolean;
}

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  actions: { display: 'flex', justifyContent: 'flex-end' },
  pager: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
});

type Editing = { part: PartRecord | null } | null;

export function PartsTab({ suppliers, canEdit }: PartsTabProps) {
  const styles = useStyles();
  const [filters, setFilters] = useState<PartListFilters>(defaultPartListFilters);
  const [editing, setEditing] = useState<Editing>(null);
  const [stockOf, setStockOf] = useState<PartRecord | null>(null);
  const [retiring, setRetiring] = useState<PartRecord | null>(null);
  const search = useDebouncedValue(filters.search);
  const dash = useDebouncedValue(filters.dash);
  const { data, isPending, isError, error, refetch, isFetching } = usePartsList({ ...filters, search, dash });
  const pageCount = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;

  return (
    <div className={styles.root}>
      {canEdit && (
        <div className={styles.actions}>
          <Button appearance="primary" icon={<AddRegular />} onClick={() => setEditing({ part: null })}>
            New part
          </Button>
        </div>
      )}
      <PartsToolbar
        filters={filters}
        suppliers={suppliers}
        onChange={(change) => setFilters((current) => ({ ...current, ...change, page: 1 }))}
      />
      {isPending && <Spinner label="Loading parts…" />}
      {isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The parts could not be loaded: {error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {data && data.items.length === 0 && <Text as="p">No parts match these filters.</Text>}
      {data && data.items.length > 0 && (
        <>
          <PartsTable
            parts={data.items}
            suppliers={suppliers}
            canEdit={canEdit}
            onEdit={(part) => setEditing({ part })}
            onStock={setStockOf}
            onRetire={setRetiring}
          />
          <div className={styles.pager}>
            <Text size={200} aria-live="polite">
              {data.total} {data.total === 1 ? 'part' : 'parts'} · page {data.page} of {pageCount}
              {isFetching ? ' · updating…' : ''}
            </Text>
            {pageCount > 1 && (
              <>
                <Button size="small" disabled={filters.page <= 1} onClick={() => setFilters((f) => ({ ...f, page: f.page - 1 }))}>
                  Previous
                </Button>
                <Button size="small" disabled={filters.page >= pageCount} onClick={() => setFilters((f) => ({ ...f, page: f.page + 1 }))}>
                  Next
                </Button>
              </>
            )}
          </div>
        </>
      )}
      {editing && (
        <PartEditorDialog key={editing.part?.id ?? 'new'} part={editing.part} suppliers={suppliers} onClose={() => setEditing(null)} />
      )}
      {stockOf && <StockDialog key={stockOf.id} part={stockOf} canAdjust={canEdit} onClose={() => setStockOf(null)} />}
      {retiring && <RetirePartDialog key={retiring.id} part={retiring} onClose={() => setRetiring(null)} />}
    </div>
  );
}
