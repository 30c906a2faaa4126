import { Button, MessageBar, MessageBarActions, MessageBarBody, Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import { Link } from 'react-router-dom';
import { ApiError } from '../../../lib/api-error';
import { SketchPreview } from '../../sketch/components/SketchPreview';
import { useAuditTrail, useCircuitReview } from '../hooks/useCircuitReview';
import { lastSignedOffBefore } from '../utils/audit-text';
import { flaggedIds } from '../utils/flag-place';
import { reviewReadiness } from '../utils/review-readiness';
import { comparePath, sheetPath } from '../utils/review-paths';
import { AuditTrail } from './AuditTrail';
import { CutListSummary } from './CutListSummary';
import { DecisionActions } from './DecisionActions';
import { DecisionBanner } from './DecisionBanner';
import { ReviewFlags } from './ReviewFlags';

export interface ReviewPanelProps {
  circuitId: string;
  /** The user is a reviewer or admin: may acknowledge, approve and return. */
  canDecide: boolean;
}

const useStyles = makeStyles({
  layout: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr) 280px', gap: tokens.spacingHorizontalXXL, alignItems: 'start' },
  main: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL, minWidth: 0 },
  aside: {
    position: 'sticky',
    top: 0,
    padding: tokens.spacingHorizontalM,
    borderLeft: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`,
  },
  links: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalL },
  link: { color: tokens.colorBrandForegroundLink },
  sketch: { border: `${tokens.strokeWidthThin} solid ${tokens.colorNeutralStroke2}`, alignSelf: 'flex-start' },
});

/** The submitted revision: sketch with its flagged items, flags by severity, decision, cut list and history. */
export function ReviewPanel({ circuitId, canDecide }: ReviewPanelProps) {
  const styles = useStyles();
  const review = useCircuitReview(circuitId);
  const audit = useAuditTrail(circuitId);

  if (review.isPending) return <Spinner label="Loading the review…" />;
  if (review.isError) {
    if (review.error instanceof ApiError && review.error.status === 404) {
      return <Text as="p">This circuit has not been submitted for review yet.</Text>;
    }
    return (
      <MessageBar intent="error" role="alert">
        <MessageBarBody>The review could not be loaded: {review.error.message}</MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => void review.refetch()}>Try again</Button>
        </MessageBarActions>
      </MessageBar>
    );
  }

  const data = review.data;
  const readiness = reviewReadiness(data.evaluation.flags, data.acknowledgements);
  const inReview = data.status === 'in-review' && data.decision === null;
  const signedOff = audit.data ? lastSignedOffBefore(audit.data, data.revisionNumber) : null;
  const previous = signedOff ?? (data.revisionNumber > 1 ? data.revisionNumber - 1 : null);

  return (
    <div className={styles.layout}>
      <div className={styles.main}>
        <DecisionBanner review={data} />
        <nav className={styles.links} aria-label="Revision links">
          {previous !== null && (
            <Link className={styles.link} to={comparePath(circuitId, previous, data.revisionNumber)}>
              {signedOff !== null ? `What changed since the last sign-off (revision ${signedOff})` : `What changed since revision ${previous}`}
            </Link>
          )}
          <Link className={styles.link} to={sheetPath(circuitId, data.revisionNumber)}>
            Shop sheet of revision {data.revisionNumber}
          </Link>
        </nav>
        <div className={styles.sketch}>
          <SketchPreview
            document={data.document}
            evaluation={data.evaluation}
            highlightIds={flaggedIds([...readiness.blockers, ...readiness.cautions.filter((c) => !c.acknowledgement).map((c) => c.flag)])}
            width={720}
            height={420}
            label={`Revision ${data.revisionNumber}`}
          />
        </div>
        <ReviewFlags circuitId={circuitId} document={data.document} readiness={readiness} canAcknowledge={canDecide && inReview} />
        {canDecide && inReview && <DecisionActions circuitId={circuitId} revisionNumber={data.revisionNumber} readiness={readiness} />}
        <section aria-labelledby="review-cut-list-title">
          <Text as="h2" id="review-cut-list-title" size={500} weight="semibold">
            Cut list
          </Text>
          <CutListSummary document={data.document} evaluation={data.evaluation} />
        </section>
      </div>
      <aside className={styles.aside} aria-label="History of the circuit">
        <AuditTrail circuitId={circuitId} />
      </aside>
    </div>
  );
}
