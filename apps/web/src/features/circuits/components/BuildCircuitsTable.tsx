import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, makeStyles, tokens } from '@fluentui/react-components';
import { circuitKinds } from '@linesmith/routing';
import { Link, useNavigate } from 'react-router-dom';
import type { Circuit } from '../api/circuit-schema';
import { fluidLabels } from '../utils/fluid-labels';
import { CircuitCheckCells } from './CircuitCheckCells';
import { CircuitRatings } from './CircuitRatings';
import { CircuitStatusBadge } from './CircuitStatusBadge';

export interface BuildCircuitsTableProps {
  circuits: readonly Circuit[];
}

const useStyles = makeStyles({
  row: {
    cursor: 'pointer',
    ':focus-visible': { outline: `${tokens.strokeWidthThick} solid ${tokens.colorStrokeFocus2}`, outlineOffset: '-2px' },
  },
  name: { color: tokens.colorBrandForegroundLink, fontWeight: tokens.fontWeightSemibold, textDecorationLine: 'none' },
});

/** The circuits of a build with their status, ratings, flags and hose totals; a row opens the circuit. */
export function BuildCircuitsTable({ circuits }: BuildCircuitsTableProps) {
  const styles = useStyles();
  const navigate = useNavigate();
  return (
    <Table size="small" aria-label="Circuits">
      <TableHeader>
        <TableRow>
          <TableHeaderCell>Circuit</TableHeaderCell>
          <TableHeaderCell>Status</TableHeaderCell>
          <TableHeaderCell>Kind</TableHeaderCell>
          <TableHeaderCell>Fluid</TableHeaderCell>
          <TableHeaderCell>Max pressure · temperature</TableHeaderCell>
          <TableHeaderCell>Flags</TableHeaderCell>
          <TableHeaderCell>Cut list</TableHeaderCell>
          <TableHeaderCell>Parts cost</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {circuits.map((circuit) => {
          const to = `/circuits/${encodeURIComponent(circuit.id)}`;
          return (
            <TableRow
              key={circuit.id}
              className={styles.row}
              tabIndex={0}
              onClick={() => navigate(to)}
              onKeyDown={(event) => {
                if (event.key === 'Enter' && event.target === event.currentTarget) navigate(to);
              }}
            >
              <TableCell>
                <Link to={to} className={styles.name} tabIndex={-1} onClick={(e) => e.stopPropagation()}>
                  {circuit.name}
                </Link>
              </TableCell>
              <TableCell>
                <CircuitStatusBadge status={circuit.status} />
              </TableCell>
              <TableCell>{circuitKinds[circuit.kind].label}</TableCell>
              <TableCell>{fluidLabels[circuit.fluid]}</TableCell>
              <TableCell>
                <CircuitRatings maxPressurePsi={circuit.maxPressurePsi} maxTempF={circuit.maxTempF} />
              </TableCell>
              <CircuitCheckCells circuitId={circuit.id} />
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}
