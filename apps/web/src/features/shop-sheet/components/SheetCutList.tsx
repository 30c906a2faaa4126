import { makeStyles, tokens } from '@fluentui/react-components';
import type { Part } from '@linesmith/catalog';
import { formatCutLength, formatLength, type CircuitDocument, type CircuitEvaluation } from '@linesmith/routing';
import { endStackParts, portName } from '../../circuits/utils/end-stack-text';
import { partNames } from '../../reviews/utils/part-names';

export interface SheetCutListProps {
  document: CircuitDocument;
  evaluation: CircuitEvaluation;
  parts: ReadonlyMap<string, Part>;
}

const useStyles = makeStyles({
  table: { width: '100%', borderCollapse: 'collapse', fontSize: tokens.fontSizeBase200 },
  cell: { border: '1px solid #6b7280', padding: '4px 6px', verticalAlign: 'top', textAlign: 'left' },
  number: { textAlign: 'right', whiteSpace: 'nowrap', fontVariantNumeric: 'tabular-nums', fontWeight: tokens.fontWeightSemibold },
  stack: { margin: 0, paddingLeft: '1.2em' },
});

/** Both units side by side, so a tape in either reads straight off the sheet. */
const both = (valueIn: number) => `${formatLength(valueIn, 'in')} (${formatLength(valueIn, 'mm')})`;

/**
 * The cut list as the bench uses it: per line the hose, the cut length in fractional inches and
 * in mm, each end stack in assembly order (port outward), supports from the start port and sleeves.
 */
export function SheetCutList({ document, evaluation, parts }: SheetCutListProps) {
  const styles = useStyles();
  const names = partNames(evaluation.bom);
  const c = styles.cell;
  return (
    <table className={styles.table} aria-label="Cut list">
      <thead>
        <tr>
          {['Line', 'Hose', 'Cut length (in)', 'Cut length (mm)', 'End stack at start (port outward)', 'End stack at end (port outward)', 'Supports from the start port', 'Sleeves'].map(
            (h) => (
              <th key={h} className={c} scope="col">
                {h}
              </th>
            ),
          )}
        </tr>
      </thead>
      <tbody>
        {evaluation.lines.length === 0 && (
          <tr>
            <td className={c} colSpan={8}>
              No lines drawn in this revision.
            </td>
          </tr>
        )}
        {evaluation.lines.map((report) => {
          const index = document.lines.findIndex((l) => l.id === report.lineId);
          const line = document.lines[index];
          const hose = report.hosePartId ? parts.get(report.hosePartId) : undefined;
          const hoseText = report.hosePartId ? (names.get(report.hosePartId) ?? hose?.description ?? report.hosePartId) : 'No hose picked';
          const dash = hose?.kind === 'hose' ? ` (-${hose.attributes.dash})` : '';
          const cut = report.cutLengthIn;
          return (
            <tr key={report.lineId}>
              <td className={c}>
                <strong>Line {index + 1}</strong>
                {line && (
                  <div>
                    {portName(document, line.from)} → {portName(document, line.to)}
                  </div>
                )}
              </td>
              <td className={c}>
                {hoseText}
                {dash}
              </td>
              <td className={`${c} ${styles.number}`}>{cut === null ? 'Not worked out' : formatCutLength(cut, 'in')}</td>
              <td className={`${c} ${styles.number}`}>{cut === null ? '—' : formatCutLength(cut, 'mm')}</td>
              {(['from', 'to'] as const).map((end) => (
                <td key={end} className={c}>
                  {line && line.endStacks[end].length > 0 ? (
                    <ol className={styles.stack}>
                      {endStackParts(line.endStacks[end], names).map((text, i) => (
                        <li key={`${i}-${text}`}>{text}</li>
                      ))}
                    </ol>
                  ) : (
                    '—'
                  )}
                </td>
              ))}
              <td className={c}>{report.supports.atIn.length === 0 ? 'None' : report.supports.atIn.map((s) => both(s.atIn)).join('; ')}</td>
              <td className={c}>
                {report.sleeves.placed.length === 0
                  ? 'None'
                  : report.sleeves.placed.map((s) => `${both(s.lengthIn)} from ${formatLength(s.startIn, 'in')} to ${formatLength(s.endIn, 'in')}`).join('; ')}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
