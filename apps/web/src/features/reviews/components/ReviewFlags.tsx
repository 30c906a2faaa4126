import { Card, Text, makeStyles, tokens } from '@fluentui/react-components';
import type { CircuitDocument, Flag } from '@linesmith/routing';
import { SeverityLabel } from '../../reference/components/SeverityLabel';
import { formatDateTime } from '../../users/utils/format-date-time';
import { personName } from '../api/review-schemas';
import { flagPlace } from '../utils/flag-place';
import type { ReviewReadiness } from '../utils/review-readiness';
import { AcknowledgeForm } from './AcknowledgeForm';

export interface ReviewFlagsProps {
  circuitId: string;
  document: CircuitDocument;
  readiness: ReviewReadiness;
  /** False when the user may not decide, or the revision is no longer in review. */
  canAcknowledge: boolean;
}

const useStyles = makeStyles({
  group: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  list: { listStyle: 'none', margin: 0, padding: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS },
  card: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalXS },
  head: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalM, alignItems: 'center' },
  muted: { color: tokens.colorNeutralForeground3 },
  ack: { borderLeft: `3px solid ${tokens.colorPaletteGreenBorder2}`, paddingLeft: tokens.spacingHorizontalS },
});

function FlagText({ document, flag }: { document: CircuitDocument; flag: Flag }) {
  const styles = useStyles();
  return (
    <>
      <div className={styles.head}>
        <SeverityLabel level={flag.severity} />
        <Text weight="semibold">{flagPlace(document, flag)}</Text>
        <Text size={200} className={styles.muted}>
          {flag.code}
        </Text>
      </div>
      <Text>{flag.message}</Text>
      {flag.fix && <Text className={styles.muted}>What to try: {flag.fix}</Text>}
    </>
  );
}

/** The revision's flags by severity: blockers (fabricator must fix), cautions (reviewer acknowledges), notes. */
export function ReviewFlags({ circuitId, document, readiness, canAcknowledge }: ReviewFlagsProps) {
  const styles = useStyles();
  const { blockers, cautions, notes } = readiness;
  return (
    <>
      <section className={styles.group} aria-labelledby="blockers-title">
        <Text as="h2" id="blockers-title" size={500} weight="semibold">
          Blockers ({blockers.length})
        </Text>
        {blockers.length === 0 ? (
          <Text>No blockers.</Text>
        ) : (
          <>
            <Text weight="semibold">Each blocker must be fixed by the fabricator — approval is disabled while any remains.</Text>
            <ul className={styles.list} aria-label="Blockers">
              {blockers.map((flag, i) => (
                <li key={`${flag.code}-${i}`}>
                  <Card className={styles.card}>
                    <FlagText document={document} flag={flag} />
                  </Card>
                </li>
              ))}
            </ul>
          </>
        )}
      </section>
      <section className={styles.group} aria-labelledby="cautions-title">
        <Text as="h2" id="cautions-title" size={500} weight="semibold">
          Cautions ({cautions.length}, {readiness.openCautions} not acknowledged)
        </Text>
        {cautions.length === 0 ? (
          <Text>No cautions.</Text>
        ) : (
          <ul className={styles.list} aria-label="Cautions">
            {cautions.map(({ key, flag, alsoFlags, acknowledgement }) => (
              <li key={key}>
                <Card className={styles.card}>
                  <FlagText document={document} flag={flag} />
                  {alsoFlags.map((also, i) => (
                    <Text key={i}>{also.message}</Text>
                  ))}
                  {acknowledgement ? (
                    <div className={styles.ack}>
                      <SeverityLabel level="ok" text={`Acknowledged by ${personName(acknowledgement.by)}, ${formatDateTime(acknowledgement.at)}`} />
                      <Text block>“{acknowledgement.note}”</Text>
                    </div>
                  ) : canAcknowledge ? (
                    <AcknowledgeForm circuitId={circuitId} flagKey={key} label={`Acknowledge ${flag.code} on ${flagPlace(document, flag)}`} />
                  ) : (
                    <Text className={styles.muted}>Not acknowledged yet.</Text>
                  )}
                </Card>
              </li>
            ))}
          </ul>
        )}
      </section>
      {notes.length > 0 && (
        <section className={styles.group} aria-labelledby="notes-title">
          <Text as="h2" id="notes-title" size={500} weight="semibold">
            Notes ({notes.length})
          </Text>
          <ul className={styles.list} aria-label="Notes">
            {notes.map((flag, i) => (
              <li key={`${flag.code}-${i}`}>
                <FlagText document={document} flag={flag} />
              </li>
            ))}
          </ul>
        </section>
      )}
    </>
  );
}
