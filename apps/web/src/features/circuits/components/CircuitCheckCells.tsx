import { Spinner, TableCell, Text } from '@fluentui/react-components';
import { formatCutLength } from '@linesmith/routing';
import { useUnitPreferences } from '../../preferences/hooks/useUnitPreferences';
import { useCircuitCheck } from '../hooks/useCircuitCheck';
import { cutListTotals } from '../utils/cut-list-totals';
import { countFlags } from '../utils/flag-counts';
import { formatMoney } from '../utils/format-money';
import { FlagCountBadges } from './FlagCountBadges';

export interface CircuitCheckCellsProps {
  circuitId: string;
}

/** Flag counts, cut-list totals and parts cost of one circuit, each row asking for its own check. */
export function CircuitCheckCells({ circuitId }: CircuitCheckCellsProps) {
  const { units } = useUnitPreferences();
  const check = useCircuitCheck(circuitId);
  if (check.isPending) {
    return (
      <>
        <TableCell>
          <Spinner size="extra-tiny" label="Checking…" />
        </TableCell>
        <TableCell />
        <TableCell />
      </>
    );
  }
  if (check.isError) {
    return (
      <>
        <TableCell>
          <Text size={200}>Check not available</Text>
        </TableCell>
        <TableCell />
        <TableCell />
      </>
    );
  }
  const totals = cutListTotals(check.data.lines);
  return (
    <>
      <TableCell>
        <FlagCountBadges counts={countFlags(check.data.flags)} />
      </TableCell>
      <TableCell>
        {totals.lines === 0
          ? 'No lines yet'
          : `${totals.lines} ${totals.lines === 1 ? 'line' : 'lines'} · ${formatCutLength(totals.totalCutIn, units.length)} hose` +
            (totals.cutLines < totals.lines ? ` (${totals.lines - totals.cutLines} not measured)` : '')}
      </TableCell>
      <TableCell>
        {formatMoney(check.data.bom.totalCents)}
        {check.data.bom.unpricedRows > 0 ? ' + unpriced parts' : ''}
      </TableCell>
    </>
  );
}
