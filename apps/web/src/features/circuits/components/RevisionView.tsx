import { Button, MessageBar, MessageBarActions, MessageBarBody, Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import { LockClosedRegular } from '@fluentui/react-icons';
import { useUnitPreferences } from '../../preferences/hooks/useUnitPreferences';
import { formatDateTime } from '../../users/utils/format-date-time';
import { useRevision } from '../hooks/useRevision';
import { CircuitCheckView } from './CircuitCheckView';
import { DraftSummaryList } from './DraftSummaryList';

export interface RevisionViewProps {
  circuitId: string;
  number: number;
}

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
    padding: tokens.spacingVerticalM,
    border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
  },
  title: { display: 'flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
});

/** One saved revision, read-only: what it held and how it checks against today's catalogue and rules. */
export function RevisionView({ circuitId, number }: RevisionViewProps) {
  const styles = useStyles();
  const { units } = useUnitPreferences();
  const { revision, check } = useRevision(circuitId, number);

  return (
    <section className={styles.root} aria-labelledby={`revision-${number}-title`}>
      <Text as="h3" id={`revision-${number}-title`} size={500} weight="semibold" className={styles.title}>
        <LockClosedRegular aria-hidden="true" /> Revision {number} (read-only)
      </Text>
      {revision.isPending && <Spinner size="small" label="Loading the revision…" />}
      {revision.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The revision could not be loaded: {revision.error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void revision.refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {revision.data && (
        <>
          <Text as="p">
            {revision.data.message || 'No message'} — {revision.data.author?.displayName || 'author not named'},{' '}
            {formatDateTime(revision.data.createdAt)}
          </Text>
          <DraftSummaryList document={revision.data.document} />
          {check.isPending && <Spinner size="small" label="Checking the revision…" />}
          {check.isError && (
            <MessageBar intent="error" role="alert">
              <MessageBarBody>The revision could not be checked: {check.error.message}</MessageBarBody>
              <MessageBarActions>
                <Button onClick={() => void check.refetch()}>Try again</Button>
              </MessageBarActions>
            </MessageBar>
          )}
          {check.data && (
            <CircuitCheckView check={check.data} document={revision.data.document} lengthUnit={units.length} headingLevel="h3" />
          )}
        </>
      )}
    </section>
  );
}
