import { Text, makeStyles, tokens } from '@fluentui/react-components';
import type { CircuitDocument } from '@linesmith/routing';
import { summariseDraft } from '../utils/draft-summary';

export interface DraftSummaryListProps {
  document: CircuitDocument;
}

const useStyles = makeStyles({
  list: { display: 'grid', gridTemplateColumns: 'max-content 1fr', columnGap: tokens.spacingHorizontalL, rowGap: tokens.spacingVerticalXXS, margin: 0 },
  term: { color: tokens.colorNeutralForeground3 },
  value: { margin: 0 },
});

/** What a circuit document holds: units, ports, lines, heat zones, scale and background. */
export function DraftSummaryList({ document }: DraftSummaryListProps) {
  const styles = useStyles();
  const summary = summariseDraft(document);
  const rows: [string, string][] = [
    ['Units', String(summary.units)],
    ['Ports', String(summary.ports)],
    ['Lines', String(summary.lines)],
    ['Heat zones', String(summary.heatZones)],
    ['Scale', summary.calibrated ? 'Calibrated' : 'Not calibrated: lengths come only from measured lines'],
    ['Background photo', summary.hasBackground ? 'Set' : 'None'],
  ];
  return (
    <dl className={styles.list} aria-label="Sketch contents">
      {rows.map(([term, value]) => (
        <Text key={term} as="span" style={{ display: 'contents' }}>
          <dt className={styles.term}>{term}</dt>
          <dd className={styles.value}>{value}</dd>
        </Text>
      ))}
    </dl>
  );
}
