import {
  Table,
  TableBody,
  TableCell,
  TableHeader,
  TableHeaderCell,
  TableRow,
  Text,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import type { LengthUnit } from '@linesmith/routing';
import type { ThreadTable } from '../api/thread-table-schema';
import { formatTableLength } from '../utils/format-table-length';
import { formatThreadPitch } from '../utils/format-thread-pitch';
import { groupRowSources } from '../utils/group-row-sources';

export interface ThreadTableViewProps {
  table: ThreadTable;
  unit: LengthUnit;
}

const useStyles = makeStyles({
  root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  number: { fontVariantNumeric: 'tabular-nums' },
  sources: { margin: 0, paddingLeft: tokens.spacingHorizontalL, color: tokens.colorNeutralForeground2 },
});

/** One family's sizes; columns that no row of the family has (tube OD, seal, NPT gauge) are left out. */
export function ThreadTableView({ table, unit }: ThreadTableViewProps) {
  const styles = useStyles();
  const { rows } = table;
  const has = {
    tubeOd: rows.some((r) => r.tubeOdIn !== undefined),
    pitchDiameter: rows.some((r) => r.basicPitchDiameterIn !== undefined),
    nptGauge: rows.some((r) => r.e0 !== undefined || r.l2 !== undefined),
    seal: rows.some((r) => r.seal !== undefined),
    seatForms: rows.some((r) => r.seatForms !== undefined),
    flank: rows.some((r) => r.flankAngleDeg !== undefined),
  };
  const length = (valueIn: number | undefined) => (valueIn === undefined ? '—' : formatTableLength(valueIn, unit));
  const majorHeader =
    table.family === 'barb'
      ? 'Hose inside diameter'
      : table.family === 'qc'
        ? 'Tube OD'
        : table.family === 'npt' || table.family === 'nptf'
          ? 'Pipe OD'
          : table.family === 'bspt'
            ? 'Major diameter at the gauge plane'
            : 'Major diameter';
  const seatWords = (forms: NonNullable<(typeof rows)[number]['seatForms']>) =>
    forms.map((f) => `${f.label}${f.tubeOdMm !== undefined ? `, ${f.tubeOdMm} mm tube` : ''}${f.seal ? `: ${f.seal}` : ''}`).join('; ');
  const sourceGroups = groupRowSources(rows);

  return (
    <div className={styles.root}>
      <Table size="extra-small" aria-label={`${table.label} threads`}>
        <TableHeader>
          <TableRow>
            <TableHeaderCell>Size</TableHeaderCell>
            <TableHeaderCell>Designation</TableHeaderCell>
            <TableHeaderCell>
              {majorHeader} ({unit})
            </TableHeaderCell>
            <TableHeaderCell>TPI or pitch</TableHeaderCell>
            {has.tubeOd && <TableHeaderCell>Tube OD ({unit})</TableHeaderCell>}
            {has.pitchDiameter && <TableHeaderCell>Basic pitch diameter ({unit})</TableHeaderCell>}
            {has.nptGauge && <TableHeaderCell>E0, pitch diameter at small end ({unit})</TableHeaderCell>}
            {has.nptGauge && <TableHeaderCell>L2, effective thread length ({unit})</TableHeaderCell>}
            {has.seal && !has.seatForms && <TableHeaderCell>Port seal</TableHeaderCell>}
            {has.seatForms && <TableHeaderCell>Seat forms and their seals</TableHeaderCell>}
            {has.flank && <TableHeaderCell>Flank angle</TableHeaderCell>}
          </TableRow>
        </TableHeader>
        <TableBody>
          {rows.map((row) => (
            <TableRow key={row.size}>
              <TableCell>{row.size}</TableCell>
              <TableCell>{row.designation}</TableCell>
              <TableCell className={styles.number}>{length(row.majorDiameterIn)}</TableCell>
              <TableCell className={styles.number}>{formatThreadPitch(row)}</TableCell>
              {has.tubeOd && <TableCell className={styles.number}>{length(row.tubeOdIn)}</TableCell>}
              {has.pitchDiameter && <TableCell className={styles.number}>{length(row.basicPitchDiameterIn)}</TableCell>}
              {has.nptGauge && <TableCell className={styles.number}>{length(row.e0)}</TableCell>}
              {has.nptGauge && <TableCell className={styles.number}>{length(row.l2)}</TableCell>}
              {has.seal && !has.seatForms && <TableCell>{row.seal ?? '—'}</TableCell>}
              {has.seatForms && <TableCell>{row.seatForms ? seatWords(row.seatForms) : '—'}</TableCell>}
              {has.flank && <TableCell className={styles.number}>{row.flankAngleDeg === undefined ? '—' : `${row.flankAngleDeg}°`}</TableCell>}
            </TableRow>
          ))}
        </TableBody>
      </Table>
      {sourceGroups.length === 1 ? (
        <Text size={200} as="p">
          Source: {sourceGroups[0]!.source}
        </Text>
      ) : (
        <ul className={styles.sources} aria-label="Sources by size">
          {sourceGroups.map((group) => (
            <li key={group.source}>
              <Text size={200}>
                {group.sizes.join(', ')}: {group.source}
              </Text>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
