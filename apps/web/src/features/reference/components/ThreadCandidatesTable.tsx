import {
  ProgressBar,
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { familyLabel, type ThreadCandidate } from '@linesmith/catalog';

export interface ThreadCandidatesTableProps {
  candidates: readonly ThreadCandidate[];
}

// The table lays its columns out at fixed widths: short columns get what they need, the hint the rest.
const useStyles = makeStyles({
  rank: { width: '4em' },
  thread: { width: '9em' },
  family: { width: '12em' },
  matchColumn: { width: '14em' },
  match: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS, minWidth: '140px' },
  bar: { flexGrow: 1 },
  percent: { fontVariantNumeric: 'tabular-nums', minWidth: '3.5em', textAlign: 'right' },
});

/** Candidate threads, best first, with how close each is and how to tell it from the others. */
export function ThreadCandidatesTable({ candidates }: ThreadCandidatesTableProps) {
  const styles = useStyles();
  return (
    <Table size="small" aria-label="Candidate threads">
      <TableHeader>
        <TableRow>
          <TableHeaderCell className={styles.rank}>Rank</TableHeaderCell>
          <TableHeaderCell className={styles.thread}>Thread</TableHeaderCell>
          <TableHeaderCell className={styles.family}>Family and size</TableHeaderCell>
          <TableHeaderCell className={styles.matchColumn}>Match</TableHeaderCell>
          <TableHeaderCell>How to tell it apart</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {candidates.map((candidate, index) => {
          const percent = `${Math.round(candidate.score * 100)} %`;
          return (
            <TableRow key={`${candidate.family}|${candidate.size}`}>
              <TableCell>{index + 1}</TableCell>
              <TableCell>{candidate.designation}</TableCell>
              <TableCell>
                {familyLabel(candidate.family)} {candidate.size}
              </TableCell>
              <TableCell>
                <span className={styles.match}>
                  <ProgressBar
                    className={styles.bar}
                    value={candidate.score}
                    max={1}
                    thickness="large"
                    aria-label={`Match ${percent}`}
                  />
                  <span className={styles.percent}>{percent}</span>
                </span>
              </TableCell>
              <TableCell>{candidate.hint}</TableCell>
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}
