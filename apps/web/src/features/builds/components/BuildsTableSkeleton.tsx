import { Skeleton, SkeletonItem, makeStyles, tokens } from '@fluentui/react-components';

export interface BuildsTableSkeletonProps {
  rows?: number;
}

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  row: { display: 'grid', gridTemplateColumns: '3fr 2fr 1fr 2fr 2fr 2fr', gap: tokens.spacingHorizontalM },
});

/** The table's shape while the first page loads, so the screen does not jump. */
export function BuildsTableSkeleton({ rows = 6 }: BuildsTableSkeletonProps) {
  const styles = useStyles();
  return (
    <Skeleton aria-label="Loading builds…" className={styles.root}>
      {Array.from({ length: rows }, (_, row) => (
        <div key={row} className={styles.row}>
          {Array.from({ length: 6 }, (_, cell) => (
            <SkeletonItem key={cell} size={16} />
          ))}
        </div>
      ))}
    </Skeleton>
  );
}
