import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, makeStyles, tokens } from '@fluentui/react-components';
import { Link, useNavigate } from 'react-router-dom';
import { SeverityLabel } from '../../reference/components/SeverityLabel';
import { formatDateTime } from '../../users/utils/format-date-time';
import { personName, type ReviewQueueRow } from '../api/review-schemas';
import { relativeTime } from '../utils/relative-time';
import { reviewPath } from '../utils/review-paths';

export interface ReviewQueueTableProps {
  rows: readonly ReviewQueueRow[];
}

const useStyles = makeStyles({
  row: { cursor: 'pointer' },
  link: { color: tokens.colorBrandForegroundLink, fontWeight: tokens.fontWeightSemibold },
  counts: { display: 'flex', gap: tokens.spacingHorizontalM },
});

/** One row per submitted circuit; the circuit name (or a click anywhere on the row) opens its review. */
export function ReviewQueueTable({ rows }: ReviewQueueTableProps) {
  const styles = useStyles();
  const navigate = useNavigate();
  return (
    <Table size="small" aria-label="Review queue">
      <TableHeader>
        <TableRow>
          <TableHeaderCell>Build</TableHeaderCell>
          <TableHeaderCell>Circuit</TableHeaderCell>
          <TableHeaderCell>Fabricator</TableHeaderCell>
          <TableHeaderCell style={{ width: '90px' }}>Revision</TableHeaderCell>
          <TableHeaderCell>Submitted</TableHeaderCell>
          <TableHeaderCell>Flags</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {rows.map((row) => (
          <TableRow key={row.circuitId} className={styles.row} onClick={() => void navigate(reviewPath(row.circuitId))}>
            <TableCell>{row.build.label}</TableCell>
            <TableCell>
              <Link className={styles.link} to={reviewPath(row.circuitId)} onClick={(e) => e.stopPropagation()}>
                {row.circuitName}
              </Link>
            </TableCell>
            <TableCell>{personName(row.fabricator)}</TableCell>
            <TableCell>{row.revisionNumber}</TableCell>
            <TableCell>
              {/* A native tooltip: the absolute time on hover, without a portal over the table. */}
              <time dateTime={row.submittedAt} title={formatDateTime(row.submittedAt)}>
                {relativeTime(row.submittedAt)}
              </time>
            </TableCell>
            <TableCell>
              <span className={styles.counts}>
                <SeverityLabel level={row.blockers > 0 ? 'blocker' : 'ok'} text={`${row.blockers} ${row.blockers === 1 ? 'blocker' : 'blockers'}`} />
                <SeverityLabel level={row.cautions > 0 ? 'caution' : 'ok'} text={`${row.cautions} ${row.cautions === 1 ? 'caution' : 'cautions'}`} />
              </span>
            </TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
