import { Button, Field, Textarea, makeStyles, tokens } from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { describeError } from '../../../lib/describe-error';
import { useAcknowledgeFlag } from '../hooks/useReviewActions';
import { acknowledgeFormSchema } from '../utils/review-form-schemas';

export interface AcknowledgeFormProps {
  circuitId: string;
  flagKey: string;
  /** Names the caution for screen readers ("Acknowledge support-gap on Line 1"). */
  label: string;
}

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalS, alignItems: 'flex-start' },
  note: { width: '100%' },
});

/** A caution is acknowledged with a note: what the reviewer checked, or why it is acceptable on this vehicle. */
export function AcknowledgeForm({ circuitId, flagKey, label }: AcknowledgeFormProps) {
  const styles = useStyles();
  const acknowledge = useAcknowledgeFlag(circuitId);
  const [note, setNote] = useState('');
  const [error, setError] = useState<string | undefined>();

  async function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const parsed = acknowledgeFormSchema.safeParse({ note });
    if (!parsed.success) {
      setError(parsed.error.issues[0]?.message);
      return;
    }
    setError(undefined);
    try {
      await acknowledge.mutateAsync({ flagKey, note: parsed.data.note });
      setNote('');
    } catch (cause) {
      setError(describeError(cause, 'The acknowledgement could not be saved.'));
    }
  }

  return (
    <form className={styles.form} onSubmit={submit} noValidate aria-label={label}>
      <Field className={styles.note} label="Reviewer's note" required validationMessage={error} hint="What you checked, or why this caution is acceptable here.">
        <Textarea value={note} onChange={(_, d) => setNote(d.value)} resize="vertical" />
      </Field>
      <Button type="submit" appearance="secondary" disabled={acknowledge.isPending}>
        {acknowledge.isPending ? 'Saving…' : 'Acknowledge caution'}
      </Button>
    </form>
  );
}
