import { Button, Field, MessageBar, MessageBarBody, MessageBarTitle, Text, Textarea, makeStyles, tokens } from '@fluentui/react-components';
import { CheckmarkRegular, ArrowUndoRegular } from '@fluentui/react-icons';
import { useState, type FormEvent } from 'react';
import { ApiError } from '../../../lib/api-error';
import { describeError } from '../../../lib/describe-error';
import { useApproveReview, useReturnReview } from '../hooks/useReviewActions';
import { approveFormSchema, returnFormSchema } from '../utils/review-form-schemas';
import type { ReviewReadiness } from '../utils/review-readiness';

export interface DecisionActionsProps {
  circuitId: string;
  revisionNumber: number;
  readiness: ReviewReadiness;
}

const useStyles = makeStyles({
  root: { display: 'grid', gridTemplateColumns: 'repeat(auto-fit, minmax(280px, 1fr))', gap: tokens.spacingHorizontalXL },
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, alignItems: 'flex-start' },
  field: { width: '100%' },
});

/** Why the Approve button is disabled, in words (the button alone does not say). */
function blockedReason({ blockers, openCautions }: ReviewReadiness): string | null {
  const reasons = [
    blockers.length > 0 ? `${blockers.length} ${blockers.length === 1 ? 'blocker' : 'blockers'} must be fixed by the fabricator` : null,
    openCautions > 0 ? `${openCautions} ${openCautions === 1 ? 'caution needs' : 'cautions need'} an acknowledgement` : null,
  ].filter(Boolean);
  return reasons.length ? `Approval is disabled: ${reasons.join('; ')}.` : null;
}

/** Approve (only with no blocker and every caution acknowledged) or return with comments. */
export function DecisionActions({ circuitId, revisionNumber, readiness }: DecisionActionsProps) {
  const styles = useStyles();
  const approve = useApproveReview(circuitId);
  const giveBack = useReturnReview(circuitId);
  const [note, setNote] = useState('');
  const [comments, setComments] = useState('');
  const [approveError, setApproveError] = useState<string | null>(null);
  const [commentsError, setCommentsError] = useState<string | undefined>();
  const [returnError, setReturnError] = useState<string | null>(null);
  const reason = blockedReason(readiness);

  async function submitApproval(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    if (!readiness.canApprove) return;
    setApproveError(null);
    const parsed = approveFormSchema.safeParse({ note });
    if (!parsed.success) {
      setApproveError(parsed.error.issues[0]?.message ?? 'The note is not valid.');
      return;
    }
    try {
      await approve.mutateAsync(parsed.data.note ? { note: parsed.data.note } : {});
    } catch (error) {
      // 409 review_blocked: the server found open items this page did not show (someone else changed them).
      const prefix = error instanceof ApiError && error.code === 'review_blocked' ? 'The server refused the approval. ' : '';
      setApproveError(prefix + describeError(error, 'The revision could not be approved.'));
    }
  }

  async function submitReturn(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setReturnError(null);
    const parsed = returnFormSchema.safeParse({ comments });
    if (!parsed.success) {
      setCommentsError(parsed.error.issues[0]?.message);
      return;
    }
    setCommentsError(undefined);
    try {
      await giveBack.mutateAsync({ comments: parsed.data.comments });
    } catch (error) {
      setReturnError(describeError(error, 'The circuit could not be returned.'));
    }
  }

  return (
    <section aria-labelledby="decision-title">
      <Text as="h2" id="decision-title" size={500} weight="semibold">
        Decision on revision {revisionNumber}
      </Text>
      <div className={styles.root}>
        <form className={styles.form} onSubmit={submitApproval} noValidate aria-label="Approve">
          {reason && (
            <Text id="approve-blocked" role="note">
              {reason}
            </Text>
          )}
          <Field className={styles.field} label="Approval note (optional)">
            <Textarea value={note} onChange={(_, d) => setNote(d.value)} disabled={!readiness.canApprove} />
          </Field>
          {approveError && (
            <MessageBar intent="error" role="alert">
              <MessageBarBody>
                <MessageBarTitle>Not approved</MessageBarTitle>
                {approveError}
              </MessageBarBody>
            </MessageBar>
          )}
          <Button
            type="submit"
            appearance="primary"
            icon={<CheckmarkRegular />}
            disabled={!readiness.canApprove || approve.isPending}
            aria-describedby={reason ? 'approve-blocked' : undefined}
          >
            {approve.isPending ? 'Approving…' : `Approve revision ${revisionNumber}`}
          </Button>
        </form>
        <form className={styles.form} onSubmit={submitReturn} noValidate aria-label="Return">
          <Field className={styles.field} label="Comments for the fabricator" required validationMessage={commentsError}>
            <Textarea value={comments} onChange={(_, d) => setComments(d.value)} />
          </Field>
          {returnError && (
            <MessageBar intent="error" role="alert">
              <MessageBarBody>{returnError}</MessageBarBody>
            </MessageBar>
          )}
          <Button type="submit" icon={<ArrowUndoRegular />} disabled={giveBack.isPending}>
            {giveBack.isPending ? 'Returning…' : 'Return to the fabricator'}
          </Button>
        </form>
      </div>
    </section>
  );
}
