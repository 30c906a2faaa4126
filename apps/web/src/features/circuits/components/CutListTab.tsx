import { Button, MessageBar, MessageBarActions, MessageBarBody, Spinner, makeStyles, tokens } from '@fluentui/react-components';
import { useUnitPreferences } from '../../preferences/hooks/useUnitPreferences';
import { useCircuitCheck } from '../hooks/useCircuitCheck';
import { useCircuitDraft } from '../hooks/useCircuitDraft';
import { CircuitCheckView } from './CircuitCheckView';
import { LengthUnitToggle } from './LengthUnitToggle';

export interface CutListTabProps {
  circuitId: string;
}

const useStyles = makeStyles({ root: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM } });

/** The cut list and parts of the working draft, as the server's check works them out. */
export function CutListTab({ circuitId }: CutListTabProps) {
  const styles = useStyles();
  const { units } = useUnitPreferences();
  const check = useCircuitCheck(circuitId);
  const draft = useCircuitDraft(circuitId);

  return (
    <div className={styles.root}>
      <LengthUnitToggle />
      {check.isPending && <Spinner label="Checking the circuit…" />}
      {check.isError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>The circuit could not be checked: {check.error.message}</MessageBarBody>
          <MessageBarActions>
            <Button onClick={() => void check.refetch()}>Try again</Button>
          </MessageBarActions>
        </MessageBar>
      )}
      {check.data && <CircuitCheckView check={check.data} document={draft.data?.document} lengthUnit={units.length} />}
    </div>
  );
}
