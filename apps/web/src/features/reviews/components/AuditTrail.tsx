import { Button, MessageBar, MessageBarActions, MessageBarBody, Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import { formatDateTime } from '../../users/utils/format-date-time';
import { useAuditTrail } from '../hooks/useCircuitReview';
import { auditActionLabel, auditDetailText } from '../utils/audit-text';

export interface AuditTrailProps {
  circuitId: string;
}

const useStyles = makeStyles({
  list: { listStyle: 'none', margin: 0, padding: 0, display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  muted: { color: tokens.colorNeutralForeground3 },
});

/** Who did what and when on this circuit, newest first. */
export function AuditTrail({ circuitId }: AuditTrailProps) {
  const styles = useStyles();
  const audit = useAuditTrail(circuitId);
  return (
    <section aria-labelledby="audit-title">
      <Text as="h2" id="audit-title" size={400} weight="semibold">
        History
      </Text>
      {audit.isPending && <Spinner size="small" label="Loading the history…" />}
      {audit.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The history could not be loaded: {audit.error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void audit.refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {audit.data && audit.data.length === 0 && <Text as="p">Nothing recorded yet.</Text>}
      {audit.data && audit.data.length > 0 && (
        <ol className={styles.list} aria-label="History">
          {[...audit.data]
            .sort((a, b) => b.at.localeCompare(a.at))
            .map((entry, i) => {
              const detail = auditDetailText(entry);
              return (
                <li key={`${entry.at}-${i}`}>
                  <Text block weight="semibold">
                    {auditActionLabel(entry.action)}
                    {entry.revisionNumber !== null && ` · revision ${entry.revisionNumber}`}
                  </Text>
                  <Text block size={200} className={styles.muted}>
                    {entry.actor?.displayName ?? 'Linesmith'} · <time dateTime={entry.at}>{formatDateTime(entry.at)}</time>
                  </Text>
                  {detail && <Text block size={200}>“{detail}”</Text>}
                </li>
              );
            })}
        </ol>
      )}
    </section>
  );
}
