import { Button, MessageBar, MessageBarActions, MessageBarBody, Spinner, Text, makeStyles, tokens } from '@fluentui/react-components';
import type { Circuit } from '../../circuits/api/circuit-schema';
import { DraftSummaryList } from '../../circuits/components/DraftSummaryList';
import { useCircuitDraft } from '../../circuits/hooks/useCircuitDraft';

export interface SketchTabProps {
  circuit: Circuit;
}

const useStyles = makeStyles({ root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM } });

/**
 * The Sketch tab of a circuit, loaded as its own chunk. The sketch editor mounts here; until
 * it does, the tab states what the working draft holds.
 */
export function SketchTab({ circuit }: SketchTabProps) {
  const styles = useStyles();
  const draft = useCircuitDraft(circuit.id);
  if (draft.isPending) return <Spinner label="Loading the sketch…" />;
  if (draft.isError) {
    return (
      <MessageBar intent="error" role="alert">
        <MessageBarBody>The sketch could not be loaded: {draft.error.message}</MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => void draft.refetch()}>Try again</Button>
        </MessageBarActions>
      </MessageBar>
    );
  }
  return (
    <section className={styles.root} aria-labelledby="sketch-title">
      <Text as="h2" id="sketch-title" size={500} weight="semibold">
        Working draft (version {draft.data.draftVersion})
      </Text>
      <DraftSummaryList document={draft.data.document} />
    </section>
  );
}
