import { Text, makeStyles, tokens } from '@fluentui/react-components';
import type { MateResult } from '@linesmith/catalog';
import { mateVerdicts } from '../utils/mate-verdict';
import { SeverityLabel } from './SeverityLabel';

export interface MateResultViewProps {
  result: MateResult;
}

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
    padding: tokens.spacingVerticalM,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
    backgroundColor: tokens.colorNeutralBackground2,
    maxWidth: '760px',
  },
});

/** The mating verdict in plain words: icon and text for the outcome, the reason, and the bench hint. */
export function MateResultView({ result }: MateResultViewProps) {
  const styles = useStyles();
  const verdict = mateVerdicts[result.code];
  return (
    <div className={styles.root} role="status" aria-live="polite" aria-label="Joint check result">
      <SeverityLabel level={result.caution ? 'caution' : verdict.level} text={result.caution ? 'Joins, with a caution' : verdict.text} />
      <Text>{result.message}</Text>
      {result.caution && (
        <Text>
          <strong>Caution:</strong> {result.caution}
        </Text>
      )}
      {result.hint && (
        <Text>
          <strong>How to tell them apart:</strong> {result.hint}
        </Text>
      )}
    </div>
  );
}
