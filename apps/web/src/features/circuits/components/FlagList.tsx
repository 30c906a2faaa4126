import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, makeStyles, tokens } from '@fluentui/react-components';
import { ErrorCircleRegular, InfoRegular, WarningRegular } from '@fluentui/react-icons';
import type { FlagSeverity, FlagView } from '../api/check-schema';

export interface FlagListProps {
  flags: readonly FlagView[];
}

const useStyles = makeStyles({
  severity: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalXS, whiteSpace: 'nowrap' },
  blocker: { color: tokens.colorPaletteRedForeground1 },
  caution: { color: tokens.colorPaletteDarkOrangeForeground1 },
  note: { color: tokens.colorNeutralForeground2 },
});

const severityLabel: Record<FlagSeverity, string> = { blocker: 'Blocker', caution: 'Caution', note: 'Note' };

/** Each finding of the rules engine with what to try; severity by icon and word. */
export function FlagList({ flags }: FlagListProps) {
  const styles = useStyles();
  const icon = { blocker: <ErrorCircleRegular />, caution: <WarningRegular />, note: <InfoRegular /> };
  return (
    <Table size="extra-small" aria-label="Flags">
      <TableHeader>
        <TableRow>
          <TableHeaderCell style={{ width: '110px' }}>Severity</TableHeaderCell>
          <TableHeaderCell>Finding</TableHeaderCell>
          <TableHeaderCell>What to try</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {flags.map((flag, index) => (
          <TableRow key={`${flag.code}-${flag.target.id}-${index}`}>
            <TableCell>
              <span className={`${styles.severity} ${styles[flag.severity]}`}>
                {icon[flag.severity]}
                {severityLabel[flag.severity]}
              </span>
            </TableCell>
            <TableCell>{flag.message}</TableCell>
            <TableCell>{flag.fix}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
