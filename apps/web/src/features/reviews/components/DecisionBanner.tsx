import { MessageBar, MessageBarBody, MessageBarTitle } from '@fluentui/react-components';
import { formatDateTime } from '../../users/utils/format-date-time';
import { personName, type CircuitReview } from '../api/review-schemas';

export interface DecisionBannerProps {
  review: CircuitReview;
}

/** Who decided what on this revision, or that it still waits for a decision. */
export function DecisionBanner({ review }: DecisionBannerProps) {
  const { decision, revisionNumber, submittedBy } = review;
  if (!decision) {
    return (
      <MessageBar intent="info" aria-label="Decision">
        <MessageBarBody>
          <MessageBarTitle>Revision {revisionNumber} waits for a decision</MessageBarTitle>
          {submittedBy ? `Submitted by ${submittedBy.displayName}.` : ''}
        </MessageBarBody>
      </MessageBar>
    );
  }
  const approved = decision.kind === 'approved';
  return (
    <MessageBar intent={approved ? 'success' : 'warning'} aria-label="Decision" layout="multiline">
      <MessageBarBody>
        <MessageBarTitle>
          {approved ? `Revision ${revisionNumber} approved and locked` : `Revision ${revisionNumber} returned to the fabricator`}
        </MessageBarTitle>
        by {personName(decision.by)}, {formatDateTime(decision.at)}
        {decision.text && <> — “{decision.text}”</>}
      </MessageBarBody>
    </MessageBar>
  );
}
