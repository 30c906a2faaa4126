import {
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  tokens,
  type SortDirection,
} from '@fluentui/react-components';
import { Link, useNavigate } from 'react-router-dom';
import { formatDateTime } from '../../users/utils/format-date-time';
import type { BuildSortField, SortOrder } from '../api/build-list-filters';
import type { Build } from '../api/build-schema';
import { vehicleTitle } from '../utils/vehicle-title';
import { BuildStatusBadge } from './BuildStatusBadge';
import { CircuitCountsSummary } from './CircuitCountsSummary';

export interface BuildsTableProps {
  builds: readonly Build[];
  sort: BuildSortField;
  order: SortOrder;
  onSortChange(sort: BuildSortField): void;
}

const useStyles = makeStyles({
  row: {
    cursor: 'pointer',
    ':focus-visible': { outline: `${tokens.strokeWidthThick} solid ${tokens.colorStrokeFocus2}`, outlineOffset: '-2px' },
  },
  vehicle: { color: tokens.colorBrandForegroundLink, fontWeight: tokens.fontWeightSemibold, textDecorationLine: 'none' },
  secondary: { color: tokens.colorNeutralForeground3 },
});

const toDirection = (order: SortOrder): SortDirection => (order === 'asc' ? 'ascending' : 'descending');

/** Builds of the shop; a click or Enter on a row opens the build. Sorting is done by the server. */
export function BuildsTable({ builds, sort, order, onSortChange }: BuildsTableProps) {
  const styles = useStyles();
  const navigate = useNavigate();
  const sortable = (field: BuildSortField) => ({
    sortDirection: sort === field ? toDirection(order) : undefined,
    onClick: () => onSortChange(field),
  });

  return (
    <Table size="small" sortable aria-label="Builds">
      <TableHeader>
        <TableRow>
          <TableHeaderCell>Vehicle</TableHeaderCell>
          <TableHeaderCell {...sortable('customer')}>Customer</TableHeaderCell>
          <TableHeaderCell>Status</TableHeaderCell>
          <TableHeaderCell>Circuits</TableHeaderCell>
          <TableHeaderCell {...sortable('createdAt')}>Created</TableHeaderCell>
          <TableHeaderCell {...sortable('updatedAt')}>Last changed</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {builds.map((build) => {
          const to = `/builds/${encodeURIComponent(build.id)}`;
          const engine = [build.vehicle.engine, build.vehicle.transmission].filter(Boolean).join(' · ');
          return (
            <TableRow
              key={build.id}
              className={styles.row}
              tabIndex={0}
              onClick={() => navigate(to)}
              onKeyDown={(event) => {
                if (event.key === 'Enter' && event.target === event.currentTarget) navigate(to);
              }}
            >
              <TableCell>
                <Link to={to} className={styles.vehicle} tabIndex={-1} onClick={(e) => e.stopPropagation()}>
                  {vehicleTitle(build.vehicle) || 'Unnamed vehicle'}
                </Link>
                {engine && <div className={styles.secondary}>{engine}</div>}
              </TableCell>
              <TableCell>{build.customer.name}</TableCell>
              <TableCell>
                <BuildStatusBadge status={build.status} />
              </TableCell>
              <TableCell>
                <CircuitCountsSummary counts={build.circuitCounts} />
              </TableCell>
              <TableCell>{formatDateTime(build.createdAt)}</TableCell>
              <TableCell>{formatDateTime(build.updatedAt)}</TableCell>
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}
