import {
  Badge,
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  Field,
  Input,
  makeStyles,
  Text,
  tokens,
} from '@fluentui/react-components';
import { useState } from 'react';
import type { DraftAutosave, SaveStatus } from '../hooks/useDraftAutosave';

export interface SaveControlsProps {
  autosave: DraftAutosave;
  /** Saves a numbered version with the message; resolves with its number. */
  onSaveVersion(message: string): Promise<number>;
  canEdit: boolean;
}

const useStyles = makeStyles({
  row: { display: 'inline-flex', alignItems: 'center', gap: tokens.spacingHorizontalS },
  badge: { minWidth: '84px', justifyContent: 'flex-start' },
});

const statusText = (s: SaveStatus): { text: string; color: 'success' | 'informative' | 'warning' | 'danger' } => {
  switch (s.state) {
    case 'saved':
      return { text: '✓ Saved', color: 'success' };
    case 'unsaved':
      // Kept as short as "✓ Saved" and "↻ Saving…": a wider badge wraps the toolbar at laptop
      // widths and every edit would then resize the canvas.
      return { text: '● Unsaved', color: 'informative' };
    case 'saving':
      return { text: '↻ Saving…', color: 'informative' };
    case 'offline':
      return { text: `⚠ Offline: retrying in ${Math.round(s.retryInMs / 1000)} s`, color: 'warning' };
    case 'conflict':
      return { text: '⛔ Conflict', color: 'danger' };
    case 'error':
      return { text: `⛔ Not saved: ${s.message}`, color: 'danger' };
  }
};

/** Save state, "Save version", and the choice to make when someone else saved first. */
export function SaveControls({ autosave, onSaveVersion, canEdit }: SaveControlsProps) {
  const styles = useStyles();
  const [versionOpen, setVersionOpen] = useState(false);
  const [message, setMessage] = useState('');
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<string | null>(null);
  const { status } = autosave;
  const badge = statusText(status);

  const saveVersion = async () => {
    setBusy(true);
    setResult(null);
    try {
      if (!(await autosave.flush())) throw new Error('the draft could not be saved first');
      const number = await onSaveVersion(message.trim());
      setResult(`Saved as version ${number}.`);
      setVersionOpen(false);
      setMessage('');
    } catch (error) {
      setResult(`Version not saved: ${error instanceof Error ? error.message : String(error)}`);
    } finally {
      setBusy(false);
    }
  };

  return (
    <span className={styles.row}>
      <Badge appearance="tint" color={badge.color} role="status" aria-label="Save state" className={styles.badge}>
        {badge.text}
      </Badge>
      {result && <Text size={200}>{result}</Text>}
      <Button size="small" appearance="primary" disabled={!canEdit} onClick={() => setVersionOpen(true)}>
        Save version
      </Button>
      <Dialog open={versionOpen} onOpenChange={(_, d) => setVersionOpen(d.open)}>
        <DialogSurface aria-label="Save version">
          <form
            onSubmit={(e) => {
              e.preventDefault();
              void saveVersion();
            }}
          >
            <DialogBody>
              <DialogTitle>Save version</DialogTitle>
              <DialogContent>
                <Field label="What changed" hint="Shown in the circuit's revisions.">
                  <Input autoFocus value={message} onChange={(_, d) => setMessage(d.value)} />
                </Field>
              </DialogContent>
              <DialogActions>
                <Button onClick={() => setVersionOpen(false)}>Cancel</Button>
                <Button appearance="primary" type="submit" disabled={busy || message.trim() === ''}>
                  Save version
                </Button>
              </DialogActions>
            </DialogBody>
          </form>
        </DialogSurface>
      </Dialog>
      <Dialog open={status.state === 'conflict'} modalType="alert">
        <DialogSurface aria-label="Someone else saved this sketch">
          <DialogBody>
            <DialogTitle>Someone else saved this sketch</DialogTitle>
            <DialogContent>
              {status.state === 'conflict' && (
                <Text block>
                  The server has draft version {status.current.draftVersion}, saved after you opened the sketch. Load it (your
                  unsaved changes are dropped), or keep yours: the server&apos;s draft is first saved as a version named
                  &ldquo;Kept before overwrite&rdquo;, so nothing is lost.
                </Text>
              )}
            </DialogContent>
            <DialogActions>
              <Button onClick={autosave.loadServerDraft}>Load the server&apos;s draft</Button>
              <Button appearance="primary" onClick={() => void autosave.keepMine()}>
                Keep mine
              </Button>
            </DialogActions>
          </DialogBody>
        </DialogSurface>
      </Dialog>
    </span>
  );
}
