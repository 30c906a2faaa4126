import { MessageBar, MessageBarBody, MessageBarTitle, makeStyles, tokens } from '@fluentui/react-components';
import { brakeLineWarning, safetyCautions, safetyPrecedence } from '../utils/safety-cautions';

export interface SafetyNoteProps {
  /** Adds the brake-line warning, for screens where a brake circuit could be mistaken for scope. */
  showBrakeWarning?: boolean;
}

const useStyles = makeStyles({
  list: { margin: `${tokens.spacingVerticalXS} 0`, paddingLeft: tokens.spacingHorizontalXL },
  body: { display: 'block' },
});

/** Shown wherever Linesmith plans fuel, oil or power-steering lines, and on printed shop sheets. */
export function SafetyNote({ showBrakeWarning = false }: SafetyNoteProps) {
  const styles = useStyles();
  return (
    <MessageBar intent="warning" layout="multiline" aria-label="Safety">
      <MessageBarBody className={styles.body}>
        <MessageBarTitle>Safety</MessageBarTitle>
        <ul className={styles.list}>
          {safetyCautions.map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
          {showBrakeWarning && <li>{brakeLineWarning}</li>}
        </ul>
        <strong>{safetyPrecedence}</strong>
      </MessageBarBody>
    </MessageBar>
  );
}
