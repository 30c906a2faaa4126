import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow, Text, makeStyles, tokens } from '@fluentui/react-components';
import type { Part } from '@linesmith/catalog';
import { formatCutLength, formatLength, SLACK_RULE_WORDS, type CircuitDocument, type LengthUnit } from '@linesmith/routing';
import type { LineReportView } from '../api/check-schema';
import { endStackParts, portName } from '../utils/end-stack-text';

export interface CutListTableProps {
  lines: readonly LineReportView[];
  document: CircuitDocument | undefined;
  /** Catalogue descriptions by part id (from the bill of materials). */
  descriptions: ReadonlyMap<string, string>;
  hoseParts: ReadonlyMap<string, Part>;
  lengthUnit: LengthUnit;
}

const useStyles = makeStyles({
  stack: { margin: 0, paddingLeft: tokens.spacingHorizontalL },
  secondary: { color: tokens.colorNeutralForeground3 },
  number: { textAlign: 'right', whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums' },
});

/**
 * Per line: hose, dash size, cut length (fractional inch and mm, both always: shops cut to
 * fractions but some tapes read metric), both end stacks, supports and sleeves.
 */
export function CutListTable({ lines, document, descriptions, hoseParts, lengthUnit }: CutListTableProps) {
  const styles = useStyles();
  const len = (valueIn: number) => formatLength(valueIn, lengthUnit);
  return (
    <Table size="small" aria-label="Cut list">
      <TableHeader>
        <TableRow>
          <TableHeaderCell>Line</TableHeaderCell>
          <TableHeaderCell>Hose</TableHeaderCell>
          <TableHeaderCell>Dash</TableHeaderCell>
          <TableHeaderCell>Cut length (in)</TableHeaderCell>
          <TableHeaderCell>Cut length (mm)</TableHeaderCell>
          <TableHeaderCell>Slack</TableHeaderCell>
          <TableHeaderCell>End stack at start</TableHeaderCell>
          <TableHeaderCell>End stack at end</TableHeaderCell>
          <TableHeaderCell>Supports</TableHeaderCell>
          <TableHeaderCell>Sleeves</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {lines.map((report, index) => {
          const line = document?.lines.find((l) => l.id === report.lineId);
          const hose = report.hosePartId ? hoseParts.get(report.hosePartId) : undefined;
          const hoseDash = hose?.kind === 'hose' ? `-${hose.attributes.dash}` : '—';
          const hoseText = report.hosePartId ? (descriptions.get(report.hosePartId) ?? hose?.description ?? report.hosePartId) : 'No hose picked';
          const cut = report.cutLengthIn;
          return (
            <TableRow key={report.lineId}>
              <TableCell>
                <Text block weight="semibold">
                  Line {index + 1}
                </Text>
                {line && document && (
                  <Text block size={200} className={styles.secondary}>
                    {portName(document, line.from)} → {portName(document, line.to)}
                  </Text>
                )}
              </TableCell>
              <TableCell>{hoseText}</TableCell>
              <TableCell>{hoseDash}</TableCell>
              <TableCell className={styles.number}>
                {cut === null ? (
                  'Not measured'
                ) : (
                  <>
                    {formatCutLength(cut, 'in')}
                    {report.toleranceIn !== null && (
                      <Text block size={100} className={styles.secondary}>
                        ± {formatLength(report.toleranceIn, 'in')}
                      </Text>
                    )}
                  </>
                )}
              </TableCell>
              <TableCell className={styles.number}>{cut === null ? '—' : formatCutLength(cut, 'mm')}</TableCell>
              <TableCell>
                {cut === null ? '—' : len(report.slackIn)}
                {cut !== null && report.slackRule && (
                  <Text block size={100} className={styles.secondary}>
                    {SLACK_RULE_WORDS[report.slackRule]}
                  </Text>
                )}
              </TableCell>
              <TableCell>
                <EndStack ids={line?.endStacks.from ?? []} descriptions={descriptions} className={styles.stack} />
              </TableCell>
              <TableCell>
                <EndStack ids={line?.endStacks.to ?? []} descriptions={descriptions} className={styles.stack} />
              </TableCell>
              <TableCell>
                {report.supports.atIn.length === 0
                  ? 'None'
                  : `${report.supports.atIn.length} at ${report.supports.atIn.map((s) => len(s.atIn)).join(', ')}`}
              </TableCell>
              <TableCell>
                {report.sleeves.plannedLengthIn === 0 ? 'None needed' : `${len(report.sleeves.plannedLengthIn)} of sleeve`}
              </TableCell>
            </TableRow>
          );
        })}
      </TableBody>
    </Table>
  );
}

function EndStack({ ids, descriptions, className }: { ids: readonly string[]; descriptions: ReadonlyMap<string, string>; className: string }) {
  if (ids.length === 0) return <>—</>;
  return (
    <ol className={className}>
      {endStackParts(ids, descriptions).map((text, i) => (
        <li key={`${i}-${text}`}>{text}</li>
      ))}
    </ol>
  );
}
