import {
  Button,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { AddRegular, VehicleTruckProfileRegular } from '@fluentui/react-icons';
import { useRef, useState } from 'react';
import { useDebouncedValue } from '../../../lib/useDebouncedValue';
import { defaultBuildListFilters, type BuildSortField, type SortOrder } from '../api/build-list-filters';
import type { BuildStatus } from '../api/build-schema';
import { useBuildsList } from '../hooks/useBuildsList';
import { useSlashToFocus } from '../hooks/useSlashToFocus';
import { BuildFormDialog } from './BuildFormDialog';
import { BuildsTable } from './BuildsTable';
import { BuildsTableSkeleton } from './BuildsTableSkeleton';
import { BuildsToolbar } from './BuildsToolbar';

const useStyles = makeStyles({
  page: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  header: { display: 'flex', alignItems: 'center', justifyContent: 'space-between', gap: tokens.spacingHorizontalM },
  pager: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  empty: {
    display: 'flex',
    flexDirection: 'column',
    alignItems: 'flex-start',
    gap: tokens.spacingVerticalS,
    padding: `${tokens.spacingVerticalXXL} 0`,
    maxWidth: '560px',
  },
  emptyIcon: { fontSize: '40px', color: tokens.colorBrandForeground1 },
});

/** Text columns read best A→Z; dates newest first. */
const firstOrder: Record<BuildSortField, SortOrder> = { customer: 'asc', createdAt: 'desc', updatedAt: 'desc' };

/** Builds: every vehicle job of the shop, searchable and sortable, opening into the build page. */
export function BuildsPage() {
  const styles = useStyles();
  const searchRef = useRef<HTMLInputElement>(null);
  const [search, setSearch] = useState('');
  const [status, setStatus] = useState<BuildStatus | null>(null);
  const [sort, setSort] = useState<BuildSortField>(defaultBuildListFilters.sort);
  const [order, setOrder] = useState<SortOrder>(defaultBuildListFilters.direction);
  const [page, setPage] = useState(1);
  const [creating, setCreating] = useState(false);
  const debouncedSearch = useDebouncedValue(search);
  useSlashToFocus(searchRef);

  const filters = { ...defaultBuildListFilters, search: debouncedSearch, status, sort, direction: order, page };
  const { data, isPending, isError, error, refetch, isFetching } = useBuildsList(filters);
  const pageCount = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const filtered = debouncedSearch.trim() !== '' || status !== null;

  function changeSort(field: BuildSortField) {
    if (field === sort) setOrder((current) => (current === 'asc' ? 'desc' : 'asc'));
    else {
      setSort(field);
      setOrder(firstOrder[field]);
    }
    setPage(1);
  }

  return (
    <section className={styles.page} aria-labelledby="builds-title">
      <div className={styles.header}>
        <Text as="h1" id="builds-title" size={700} weight="semibold">
          Builds
        </Text>
        <Button appearance="primary" icon={<AddRegular />} onClick={() => setCreating(true)}>
          New build
        </Button>
      </div>

      <BuildsToolbar
        ref={searchRef}
        search={search}
        onSearchChange={(value) => {
          setSearch(value);
          setPage(1);
        }}
        status={status}
        onStatusChange={(value) => {
          setStatus(value);
          setPage(1);
        }}
      />

      {isPending && <BuildsTableSkeleton />}
      {isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The builds could not be loaded: {error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {data && data.items.length === 0 && filtered && <Text as="p">No builds match this search and filter.</Text>}
      {data && data.items.length === 0 && !filtered && (
        <div className={styles.empty}>
          <VehicleTruckProfileRegular className={styles.emptyIcon} aria-hidden="true" />
          <Text as="h2" size={500} weight="semibold">
            No builds yet
          </Text>
          <Text as="p">
            A build is one vehicle job for one customer. Start one, add its circuits, and upload photos of the engine
            bay or chassis to sketch the lines on.
          </Text>
          <Button appearance="primary" icon={<AddRegular />} onClick={() => setCreating(true)}>
            Start the first build
          </Button>
        </div>
      )}
      {data && data.items.length > 0 && (
        <>
          <BuildsTable builds={data.items} sort={sort} order={order} onSortChange={changeSort} />
          <div className={styles.pager}>
            <Text size={200} aria-live="polite">
              {data.total} {data.total === 1 ? 'build' : 'builds'} · page {data.page} of {pageCount}
              {isFetching ? ' · updating…' : ''}
            </Text>
            {pageCount > 1 && (
              <>
                <Button size="small" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
                  Previous
                </Button>
                <Button size="small" disabled={page >= pageCount} onClick={() => setPage((p) => p + 1)}>
                  Next
                </Button>
              </>
            )}
          </div>
        </>
      )}

      {creating && <BuildFormDialog onClose={() => setCreating(false)} />}
    </section>
  );
}
