import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, makeStyles } from '@fluentui/react-components';
import type { ImportIssue } from '../api/price-list-schemas';

const useStyles = makeStyles({ scroll: { maxHeight: '320px', overflowY: 'auto' } });

/** The row-by-row report of a price list: which row, which column, what is wrong. */
export function ImportReportTable({ report }: { report: readonly ImportIssue[] }) {
  const styles = useStyles();
  return (
    <div className={styles.scroll}>
      <Table size="small" aria-label="Import report">
        <TableHeader>
          <TableRow>
            <TableHeaderCell>Row</TableHeaderCell>
            <TableHeaderCell>Column</TableHeaderCell>
            <TableHeaderCell>Problem</TableHeaderCell>
          </TableRow>
        </TableHeader>
        <TableBody>
          {report.map((issue, index) => (
            <TableRow key={`${issue.row}-${issue.column}-${index}`}>
              <TableCell>{issue.row}</TableCell>
              <TableCell>{issue.column || '—'}</TableCell>
              <TableCell>{issue.message}</TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </div>
  );
}
