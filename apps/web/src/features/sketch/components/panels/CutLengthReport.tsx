import { makeStyles, tokens } from '@fluentui/react-components';
import { formatCutLength, formatLength, inToMm, SLACK_RULE_WORDS, type LengthUnit, type LineReport } from '@linesmith/routing';

const useStyles = makeStyles({
  table: { borderCollapse: 'collapse', width: '100%', fontSize: tokens.fontSizeBase200 },
  cell: { padding: '1px 4px', borderBottom: `1px solid ${tokens.colorNeutralStroke2}` },
  num: { textAlign: 'right', fontVariantNumeric: 'tabular-nums' },
  total: { fontWeight: tokens.fontWeightSemibold },
});

export interface CutLengthReportProps {
  report: LineReport;
  unit: LengthUnit;
}

/** Every term of the cut length, so the fabricator can check the sum by hand. */
export function CutLengthReport({ report, unit }: CutLengthReportProps) {
  const styles = useStyles();
  const len = (v: number | null) => (v === null ? '—' : formatLength(v, unit));
  const rows: Array<[string, string, boolean?]> = [
    ['Drawn (sharp corners)', len(report.drawnLengthIn)],
    ['Centreline with bends', len(report.centrelineIn)],
    ['Measured', len(report.measuredLengthIn)],
    ['Worked from', report.basis === 'measured' ? 'measured length' : report.basis === 'drawn' ? 'drawn centreline' : 'nothing yet'],
    ['− End stack at from-port', len(report.endStackFromIn)],
    ['− End stack at to-port', len(report.endStackToIn)],
    [
      `+ Slack${report.slackRule ? ` (${SLACK_RULE_WORDS[report.slackRule]})` : ''}${report.crossesMounts ? ', crosses mount groups' : ''}`,
      len(report.slackIn),
    ],
    // The exact cut unrounded (whole mm would hide up to half a millimetre); the next row is what to cut.
    ['= Exact cut', report.exactCutIn === null ? '—' : unit === 'mm' ? `${inToMm(report.exactCutIn).toFixed(1)} mm` : `${report.exactCutIn.toFixed(3)} in`],
    ['Cut length (rounded up)', report.cutLengthIn === null ? '—' : formatCutLength(report.cutLengthIn, unit), true],
    ['Tolerance (RMA IP-2 Table 4-8)', report.toleranceIn === null ? '—' : `± ${len(report.toleranceIn)}`],
  ];
  return (
    <table className={styles.table} aria-label="Cut length">
      <tbody>
        {rows.map(([term, value, total]) => (
          <tr key={term} className={total ? styles.total : undefined}>
            <th scope="row" className={styles.cell} style={{ textAlign: 'left', fontWeight: 'inherit' }}>
              {term}
            </th>
            <td className={`${styles.cell} ${styles.num}`}>{value}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
