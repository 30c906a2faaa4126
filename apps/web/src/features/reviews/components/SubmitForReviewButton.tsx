import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  DialogTrigger,
  Field,
  MessageBar,
  MessageBarBody,
  Textarea,
} from '@fluentui/react-components';
import { SendRegular } from '@fluentui/react-icons';
import { useState, type FormEvent } from 'react';
import { describeError } from '../../../lib/describe-error';
import { useSession } from '../../auth/hooks/useSession';
import type { Circuit } from '../../circuits/api/circuit-schema';
import { useSubmitCircuit } from '../hooks/useReviewActions';

export interface SubmitForReviewButtonProps {
  circuit: Circuit;
}

/** The fabricator hands a draft (or a returned circuit) to the reviewer; the draft is saved as a revision. */
export function SubmitForReviewButton({ circuit }: SubmitForReviewButtonProps) {
  const { hasRole } = useSession();
  const submit = useSubmitCircuit(circuit.id);
  const [open, setOpen] = useState(false);
  const [message, setMessage] = useState('');
  const [error, setError] = useState<string | null>(null);
  if (!hasRole('fabricator', 'admin') || (circuit.status !== 'draft' && circuit.status !== 'returned')) return null;

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setError(null);
    try {
      const text = message.trim();
      await submit.mutateAsync(text ? { message: text } : {});
      setOpen(false);
      setMessage('');
    } catch (cause) {
      setError(describeError(cause, 'The circuit could not be submitted.'));
    }
  }

  return (
    <Dialog open={open} onOpenChange={(_, d) => setOpen(d.open)}>
      <DialogTrigger disableButtonEnhancement>
        <Button appearance="primary" icon={<SendRegular />}>
          Submit for review
        </Button>
      </DialogTrigger>
      <DialogSurface>
        <form onSubmit={handleSubmit} noValidate>
          <DialogBody>
            <DialogTitle>Submit “{circuit.name}” for review</DialogTitle>
            <DialogContent>
              <p>
                The working draft is saved as a new revision and goes to the reviewer. Blockers must be fixed before it can be approved;
                the reviewer acknowledges each caution with a note.
              </p>
              {error && (
                <MessageBar intent="error" role="alert">
                  <MessageBarBody>{error}</MessageBarBody>
                </MessageBar>
              )}
              <Field label="Message to the reviewer (optional)">
                <Textarea value={message} onChange={(_, d) => setMessage(d.value)} />
              </Field>
            </DialogContent>
            <DialogActions>
              <DialogTrigger disableButtonEnhancement>
                <Button disabled={submit.isPending}>Cancel</Button>
              </DialogTrigger>
              <Button type="submit" appearance="primary" disabled={submit.isPending}>
                {submit.isPending ? 'Submitting…' : 'Submit'}
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
